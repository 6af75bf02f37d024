import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTeam, registerUser, startTestApp, type SignedInUser, type TestApp } from './support/test-app';

describe('Malformed requests', () => {
  let testApp: TestApp;
  let owner: SignedInUser;
  let teamId: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    owner = await registerUser(testApp.app, 'owner');
    teamId = await createTeam(testApp.app, owner);
  });

  afterAll(async () => {
    await testApp.close();
  });

  type Call = (auth: string) => request.Test;
  const cases: Array<[string, Call, string[][]]> = [
    ['register without any field', () => request(testApp.app).post('/api/auth/register').send({}), [['displayName'], ['email'], ['password']]],
    [
      'register with a bad e-mail and a 9-character password',
      () => request(testApp.app).post('/api/auth/register').send({ email: 'not-an-address', password: '123456789', displayName: 'X' }),
      [['email'], ['password']],
    ],
    ['register with a blank display name', () => request(testApp.app).post('/api/auth/register').send({ email: 'blank@tests.example', password: 'long-enough-1', displayName: '   ' }), [['displayName']]],
    ['login with a number as password', () => request(testApp.app).post('/api/auth/login').send({ email: 'a@tests.example', password: 42 }), [['password']]],
    ['create a team without a name', (auth) => request(testApp.app).post('/api/teams').set('Authorization', auth).send({ name: '' }), [['name']]],
    [
      'change a role to an unknown one',
      (auth) => request(testApp.app).patch(`/api/teams/${teamId}/members/${owner.id}`).set('Authorization', auth).send({ role: 'admin' }),
      [['role']],
    ],
    [
      'invite without e-mail and with a bad role',
      (auth) => request(testApp.app).post(`/api/teams/${teamId}/invitations`).set('Authorization', auth).send({ role: 'boss' }),
      [['email'], ['role']],
    ],
    ['accept without a token', (auth) => request(testApp.app).post('/api/invitations/accept').set('Authorization', auth).send({ token: '' }), [['token']]],
  ];

  it.each(cases)('When a client sends %s, then the answer is 400 REQUEST_INVALID naming each bad field', async (_label, call, paths) => {
    const response = await call(owner.auth);

    expect(response.status).toBe(400);
    expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(response.body).toMatchObject({ type: 'urn:tallus:problem:request-invalid', title: 'Bad Request', status: 400, code: 'REQUEST_INVALID' });
    const reported = (response.body.issues as Array<{ path: string[]; message: string }>).map((issue) => issue.path);
    expect([...reported].sort()).toEqual(paths);
    expect(response.body.issues.every((issue: { message: string; code: string }) => issue.message && issue.code)).toBe(true);
  });

  it('When the body is not valid JSON, then the answer is 400 REQUEST_MALFORMED_JSON as a problem body', async () => {
    const response = await request(testApp.app).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": "a@b.example",');

    expect(response.status).toBe(400);
    expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(response.body.code).toBe('REQUEST_MALFORMED_JSON');
  });

  it('When the body is larger than 1 MB, then the answer is 413 REQUEST_TOO_LARGE', async () => {
    const response = await request(testApp.app)
      .post('/api/teams')
      .set('Authorization', owner.auth)
      .send({ name: 'x'.repeat(1_100_000) });

    expect(response.status).toBe(413);
    expect(response.body.code).toBe('REQUEST_TOO_LARGE');
  });

  it('When a malformed request fails, then nothing is created', async () => {
    await request(testApp.app).post('/api/teams').set('Authorization', owner.auth).send({ name: 'x'.repeat(121) }).expect(400);

    const teams = await request(testApp.app).get('/api/teams').set('Authorization', owner.auth);

    expect(teams.body).toHaveLength(1);
  });
});
