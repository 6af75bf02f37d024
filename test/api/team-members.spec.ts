import { memberListResponseSchema, memberSchema } from '@tallus/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, createTeam, registerUser, startTestApp, type TestApp } from './support/test-app';

describe('Teams and their members', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('When a user creates a team, then the answer is 201 with the team and role owner, and it appears in their list', async () => {
    const user = await registerUser(testApp.app, 'creator');

    const created = await request(testApp.app).post('/api/teams').set('Authorization', user.auth).send({ name: '  Tailings Cell B  ' });
    const list = await request(testApp.app).get('/api/teams').set('Authorization', user.auth);

    expect(created.status).toBe(201);
    expect(created.body).toEqual({ id: expect.any(String), name: 'Tailings Cell B', role: 'owner' });
    expect(list.body).toEqual([created.body]);
  });

  it('When members are listed, then each has user id, e-mail, name, role and join time, owners first', async () => {
    const owner = await registerUser(testApp.app, 'owner');
    const viewer = await registerUser(testApp.app, 'viewer');
    const teamId = await createTeam(testApp.app, owner);
    await addMember(testApp, teamId, viewer, 'viewer');

    const response = await request(testApp.app).get(`/api/teams/${teamId}/members`).set('Authorization', viewer.auth);

    const members = memberListResponseSchema.parse(response.body);
    expect(members.map((member) => [member.userId, member.email, member.role])).toEqual([
      [owner.id, owner.email, 'owner'],
      [viewer.id, viewer.email, 'viewer'],
    ]);
  });

  it('When an owner changes a member role, then the member comes back with the new role and /me shows it', async () => {
    const owner = await registerUser(testApp.app, 'owner');
    const member = await registerUser(testApp.app, 'member');
    const teamId = await createTeam(testApp.app, owner);
    await addMember(testApp, teamId, member, 'viewer');

    const response = await request(testApp.app)
      .patch(`/api/teams/${teamId}/members/${member.id}`)
      .set('Authorization', owner.auth)
      .send({ role: 'reviewer' });
    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', member.auth);

    expect(response.status).toBe(200);
    expect(memberSchema.parse(response.body)).toMatchObject({ userId: member.id, email: member.email, role: 'reviewer' });
    expect(me.body.memberships).toEqual([{ teamId, teamName: 'Test Team', role: 'reviewer' }]);
  });

  it('When an owner removes a member, then the answer is 204 and the former member gets 404 on the team', async () => {
    const owner = await registerUser(testApp.app, 'owner');
    const member = await registerUser(testApp.app, 'member');
    const teamId = await createTeam(testApp.app, owner);
    await addMember(testApp, teamId, member, 'editor');

    const removal = await request(testApp.app).delete(`/api/teams/${teamId}/members/${member.id}`).set('Authorization', owner.auth);
    const afterwards = await request(testApp.app).get(`/api/teams/${teamId}/members`).set('Authorization', member.auth);

    expect(removal.status).toBe(204);
    expect(afterwards.status).toBe(404);
  });

  it.each(['patch', 'delete'] as const)('When an owner %ss a user who is not a member, then the answer is 404 MEMBER_NOT_FOUND', async (method) => {
    const owner = await registerUser(testApp.app, 'owner');
    const stranger = await registerUser(testApp.app, 'stranger');
    const teamId = await createTeam(testApp.app, owner);

    const responses = await Promise.all(
      [stranger.id, 'not-a-uuid'].map((userId) =>
        request(testApp.app)[method](`/api/teams/${teamId}/members/${userId}`).set('Authorization', owner.auth).send({ role: 'viewer' }),
      ),
    );

    expect(responses.map((response) => [response.status, response.body.code])).toEqual([
      [404, 'MEMBER_NOT_FOUND'],
      [404, 'MEMBER_NOT_FOUND'],
    ]);
  });
});

describe('The last-owner rule', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it.each(['reviewer', 'editor', 'viewer'])('When the only owner demotes themselves to %s, then the answer is 409 TEAM_LAST_OWNER and they stay owner', async (role) => {
    const owner = await registerUser(testApp.app, 'owner');
    const teamId = await createTeam(testApp.app, owner);

    const response = await request(testApp.app).patch(`/api/teams/${teamId}/members/${owner.id}`).set('Authorization', owner.auth).send({ role });
    const members = await request(testApp.app).get(`/api/teams/${teamId}/members`).set('Authorization', owner.auth);

    expect(response.status).toBe(409);
    expect(response.body.code).toBe('TEAM_LAST_OWNER');
    expect(members.body.map((member: { role: string }) => member.role)).toEqual(['owner']);
  });

  it('When the only owner removes themselves, then the answer is 409 TEAM_LAST_OWNER and the team keeps them', async () => {
    const owner = await registerUser(testApp.app, 'owner');
    const editor = await registerUser(testApp.app, 'editor');
    const teamId = await createTeam(testApp.app, owner);
    await addMember(testApp, teamId, editor, 'editor');

    const response = await request(testApp.app).delete(`/api/teams/${teamId}/members/${owner.id}`).set('Authorization', owner.auth);
    const me = await request(testApp.app).get('/api/auth/me').set('Authorization', owner.auth);

    expect(response.status).toBe(409);
    expect(response.body.code).toBe('TEAM_LAST_OWNER');
    expect(me.body.memberships).toEqual([{ teamId, teamName: 'Test Team', role: 'owner' }]);
  });

  it('When a second owner exists, then the first may step down, and the second is then the last owner', async () => {
    const first = await registerUser(testApp.app, 'first');
    const second = await registerUser(testApp.app, 'second');
    const teamId = await createTeam(testApp.app, first);
    await addMember(testApp, teamId, second, 'viewer');
    await request(testApp.app).patch(`/api/teams/${teamId}/members/${second.id}`).set('Authorization', first.auth).send({ role: 'owner' }).expect(200);

    const stepDown = await request(testApp.app).patch(`/api/teams/${teamId}/members/${first.id}`).set('Authorization', first.auth).send({ role: 'editor' });
    const lastLeaves = await request(testApp.app).delete(`/api/teams/${teamId}/members/${second.id}`).set('Authorization', second.auth);

    expect(stepDown.status).toBe(200);
    expect(stepDown.body.role).toBe('editor');
    expect(lastLeaves.status).toBe(409);
    expect(lastLeaves.body.code).toBe('TEAM_LAST_OWNER');
  });

  it('When a second owner exists, then one owner may remove the other', async () => {
    const first = await registerUser(testApp.app, 'first');
    const second = await registerUser(testApp.app, 'second');
    const teamId = await createTeam(testApp.app, first);
    await addMember(testApp, teamId, second, 'owner');

    const response = await request(testApp.app).delete(`/api/teams/${teamId}/members/${first.id}`).set('Authorization', second.auth);

    expect(response.status).toBe(204);
  });

  it('When two owners demote each other at the same moment, then exactly one succeeds and the team keeps an owner', async () => {
    const first = await registerUser(testApp.app, 'first');
    const second = await registerUser(testApp.app, 'second');
    const teamId = await createTeam(testApp.app, first);
    await addMember(testApp, teamId, second, 'owner');

    const responses = await Promise.all([
      request(testApp.app).patch(`/api/teams/${teamId}/members/${second.id}`).set('Authorization', first.auth).send({ role: 'viewer' }),
      request(testApp.app).patch(`/api/teams/${teamId}/members/${first.id}`).set('Authorization', second.auth).send({ role: 'viewer' }),
    ]);
    const rows = await testApp.orm.em.fork().getConnection().execute("select count(*)::int as owners from memberships where team_id = ? and role = 'owner'", [teamId]);

    expect(responses.map((response) => response.status).sort()).toEqual([200, 403]);
    expect((rows[0] as { owners: number }).owners).toBe(1);
  });
});
