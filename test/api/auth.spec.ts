import jwt from 'jsonwebtoken';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { meResponseSchema, problemSchema } from '@tallus/contracts';
import { registerUser, startTestApp, TEST_PASSWORD, uniqueEmail, type TestApp } from './support/test-app';

describe('Accounts: register, sign in, current user, sign out', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('When a visitor registers, then they get 201 with a token and their user, and the e-mail is stored lower-cased', async () => {
    const email = uniqueEmail('Reg').toUpperCase();

    const response = await request(testApp.app)
      .post('/api/auth/register')
      .send({ email: ` ${email} `, password: TEST_PASSWORD, displayName: '  Ada Field  ' });

    expect(response.status).toBe(201);
    expect(response.body.user).toEqual({ id: expect.any(String), email: email.toLowerCase(), displayName: 'Ada Field' });
    expect(response.body.token).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
    expect(JSON.stringify(response.body)).not.toContain('passwordHash');
  });

  it('When the password is stored, then only a bcrypt hash of cost 10 or more is kept', async () => {
    const user = await registerUser(testApp.app, 'hash');

    const rows = await testApp.orm.em.fork().getConnection().execute('select password_hash from users where id = ?', [user.id]);

    const hash = (rows[0] as { password_hash: string }).password_hash;
    expect(hash).not.toContain(TEST_PASSWORD);
    expect(Number(/^\$2[aby]\$(\d\d)\$/.exec(hash)?.[1])).toBeGreaterThanOrEqual(10);
  });

  it('When the e-mail address already has an account, then registering again answers 409 AUTH_EMAIL_TAKEN', async () => {
    const user = await registerUser(testApp.app, 'dup');

    const response = await request(testApp.app)
      .post('/api/auth/register')
      .send({ email: user.email, password: 'another-password-1', displayName: 'Twin' });

    expect(response.status).toBe(409);
    expect(response.body.code).toBe('AUTH_EMAIL_TAKEN');
  });

  it('When a user signs in with the right password, then they get 200 with a token that opens /me', async () => {
    const user = await registerUser(testApp.app, 'login');

    const login = await request(testApp.app).post('/api/auth/login').send({ email: user.email.toUpperCase(), password: TEST_PASSWORD });
    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', `Bearer ${login.body.token}`);

    expect(login.status).toBe(200);
    expect(login.body.user).toEqual({ id: user.id, email: user.email, displayName: user.displayName });
    expect(me.status).toBe(200);
    expect(meResponseSchema.parse(me.body)).toEqual({ user: { id: user.id, email: user.email, displayName: user.displayName }, memberships: [] });
  });

  it('When a user signs in with a wrong password, then the answer is 401 AUTH_INVALID_CREDENTIALS as a problem body', async () => {
    const user = await registerUser(testApp.app, 'wrongpw');

    const response = await request(testApp.app).post('/api/auth/login').send({ email: user.email, password: 'not-the-password' });

    expect(response.status).toBe(401);
    expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(problemSchema.parse(response.body)).toMatchObject({ status: 401, code: 'AUTH_INVALID_CREDENTIALS' });
    expect(response.body.token).toBeUndefined();
  });

  it('When the e-mail address is unknown, then sign-in answers the same 401 as for a wrong password', async () => {
    const response = await request(testApp.app).post('/api/auth/login').send({ email: uniqueEmail('ghost'), password: TEST_PASSWORD });

    expect(response.status).toBe(401);
    expect(response.body.code).toBe('AUTH_INVALID_CREDENTIALS');
  });

  it('When a user has teams, then /me lists each membership with team name and role', async () => {
    const user = await registerUser(testApp.app, 'teams');
    const team = await request(testApp.app).post('/api/teams').set('Authorization', user.auth).send({ name: 'Basalt Plot Seven' });

    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', user.auth);

    expect(me.body.memberships).toEqual([{ teamId: team.body.id, teamName: 'Basalt Plot Seven', role: 'owner' }]);
  });

  it('When /me is called without a token, then the answer is 401 AUTH_REQUIRED', async () => {
    const response = await request(testApp.app).get('/api/auth/me');

    expect(response.status).toBe(401);
    expect(response.body.code).toBe('AUTH_REQUIRED');
  });

  it.each([
    ['a forged signature', (sub: string) => jwt.sign({ sub, jti: crypto.randomUUID() }, 'some-other-secret-that-is-long-enough!', { expiresIn: '1h' })],
    ['an expired token', (sub: string, secret: string) => jwt.sign({ sub, jti: crypto.randomUUID(), exp: Math.floor(Date.now() / 1000) - 60 }, secret)],
    ['garbage', () => 'abc.def.ghi'],
    ['an unknown user', (_sub: string, secret: string) => jwt.sign({ sub: crypto.randomUUID(), jti: crypto.randomUUID() }, secret, { expiresIn: '1h' })],
  ])('When /me is called with %s, then the answer is 401 AUTH_INVALID_TOKEN', async (_label, makeToken) => {
    const user = await registerUser(testApp.app, 'badtoken');

    const response = await request(testApp.app)
      .get('/api/auth/me')
      .set('Authorization', `Bearer ${makeToken(user.id, testApp.config.jwt.secret)}`);

    expect(response.status).toBe(401);
    expect(response.body.code).toBe('AUTH_INVALID_TOKEN');
  });

  it('When a token is issued, then it is HS256, names the user as sub, and expires after JWT_TTL (8h by default)', async () => {
    const user = await registerUser(testApp.app, 'claims');

    const header = jwt.decode(user.token, { complete: true })!;
    const payload = header.payload as jwt.JwtPayload;

    expect(header.header.alg).toBe('HS256');
    expect(payload.sub).toBe(user.id);
    expect(payload.exp! - payload.iat!).toBe(8 * 3600);
  });

  it('When a user signs out, then the answer is 204 and the same token no longer opens /me', async () => {
    const user = await registerUser(testApp.app, 'logout');

    const logout = await request(testApp.app).post('/api/auth/logout').set('Authorization', user.auth);
    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', user.auth);

    expect(logout.status).toBe(204);
    expect(me.status).toBe(401);
    expect(me.body.code).toBe('AUTH_INVALID_TOKEN');
  });

  it('When a user signs out, then a new sign-in gives a token that works', async () => {
    const user = await registerUser(testApp.app, 'relogin');
    await request(testApp.app).post('/api/auth/logout').set('Authorization', user.auth).expect(204);

    const login = await request(testApp.app).post('/api/auth/login').send({ email: user.email, password: TEST_PASSWORD });
    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', `Bearer ${login.body.token}`);

    expect(me.status).toBe(200);
  });

  it('When sign-out is called without a token, then it still answers 204', async () => {
    const response = await request(testApp.app).post('/api/auth/logout');

    expect(response.status).toBe(204);
  });
});
