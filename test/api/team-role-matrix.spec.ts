import type { Role } from '@tallus/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addMember, createTeam, registerUser, startTestApp, uniqueEmail, type SignedInUser, type TestApp } from './support/test-app';

type Actor = Role | 'outsider';

/** One team route: how to call it for a given team, with a fresh target member where it needs one. */
interface TeamRoute {
  name: string;
  call(teamId: string, actor: SignedInUser, targetId: string): request.Test;
}

const ROUTES: Record<string, TeamRoute> = {
  getTeam: { name: 'GET /teams/:teamId', call: (teamId, actor) => request(app()).get(`/api/teams/${teamId}`).set('Authorization', actor.auth) },
  listMembers: {
    name: 'GET /teams/:teamId/members',
    call: (teamId, actor) => request(app()).get(`/api/teams/${teamId}/members`).set('Authorization', actor.auth),
  },
  changeRole: {
    name: 'PATCH /teams/:teamId/members/:userId',
    call: (teamId, actor, targetId) =>
      request(app()).patch(`/api/teams/${teamId}/members/${targetId}`).set('Authorization', actor.auth).send({ role: 'editor' }),
  },
  removeMember: {
    name: 'DELETE /teams/:teamId/members/:userId',
    call: (teamId, actor, targetId) => request(app()).delete(`/api/teams/${teamId}/members/${targetId}`).set('Authorization', actor.auth),
  },
  invite: {
    name: 'POST /teams/:teamId/invitations',
    call: (teamId, actor) =>
      request(app()).post(`/api/teams/${teamId}/invitations`).set('Authorization', actor.auth).send({ email: uniqueEmail('invitee'), role: 'viewer' }),
  },
  listInvitations: {
    name: 'GET /teams/:teamId/invitations',
    call: (teamId, actor) => request(app()).get(`/api/teams/${teamId}/invitations`).set('Authorization', actor.auth),
  },
};

/** Expected status of each route for each actor (DESIGN.md §5: owners manage members and invitations). */
const MATRIX: Array<[keyof typeof ROUTES, Record<Actor, number>]> = [
  ['getTeam', { owner: 200, reviewer: 200, editor: 200, viewer: 200, outsider: 404 }],
  ['listMembers', { owner: 200, reviewer: 200, editor: 200, viewer: 200, outsider: 404 }],
  ['changeRole', { owner: 200, reviewer: 403, editor: 403, viewer: 403, outsider: 404 }],
  ['removeMember', { owner: 204, reviewer: 403, editor: 403, viewer: 403, outsider: 404 }],
  ['invite', { owner: 201, reviewer: 403, editor: 403, viewer: 403, outsider: 404 }],
  ['listInvitations', { owner: 200, reviewer: 403, editor: 403, viewer: 403, outsider: 404 }],
];

const ACTORS: Actor[] = ['owner', 'reviewer', 'editor', 'viewer', 'outsider'];
const CASES = MATRIX.flatMap(([route, statuses]) => ACTORS.map((actor) => [ROUTES[route]!.name, actor, statuses[actor], route] as const));

let testApp: TestApp;
const app = () => testApp.app;

describe('Team routes by role', () => {
  const actors = {} as Record<Actor, SignedInUser>;
  let teamId: string;

  beforeAll(async () => {
    testApp = await startTestApp();
    actors.owner = await registerUser(testApp.app, 'owner');
    teamId = await createTeam(testApp.app, actors.owner, 'Matrix Team');
    for (const role of ['reviewer', 'editor', 'viewer'] as const) {
      actors[role] = await registerUser(testApp.app, role);
      await addMember(testApp, teamId, actors[role], role);
    }
    // The outsider owns a team of their own: membership elsewhere must not open this team.
    actors.outsider = await registerUser(testApp.app, 'outsider');
    await createTeam(testApp.app, actors.outsider, 'Elsewhere');
  });

  afterAll(async () => {
    await testApp.close();
  });

  it.each(CASES)('When %s is called by the %s, then the status is %i', async (_name, actor, status, route) => {
    const target = await registerUser(testApp.app, 'target');
    await addMember(testApp, teamId, target, 'viewer');

    const response = await ROUTES[route]!.call(teamId, actors[actor], target.id);

    expect(response.status).toBe(status);
    if (status === 404) expect(response.body.code).toBe('TEAM_NOT_FOUND');
    if (status === 403) expect(response.body.code).toBe('TEAM_ROLE_REQUIRED');
  });

  it.each(['00000000-0000-4000-8000-000000000000', 'not-a-uuid', '1', "1'%20or%20'1'='1"])(
    'When a member calls every team route with the id %s of no team of theirs, then each answers 404 TEAM_NOT_FOUND',
    async (unknownId) => {
      const statuses = await Promise.all(
        Object.values(ROUTES).map(async (route) => {
          const response = await route.call(unknownId, actors.owner, actors.viewer.id);
          return [route.name, response.status, response.body.code];
        }),
      );

      expect(statuses).toEqual(Object.values(ROUTES).map((route) => [route.name, 404, 'TEAM_NOT_FOUND']));
    },
  );

  it('When an outsider asks for an existing team and a missing one, then both answers are identical apart from the request id', async () => {
    const existing = await ROUTES.listMembers!.call(teamId, actors.outsider, '');
    const missing = await ROUTES.listMembers!.call(crypto.randomUUID(), actors.outsider, '');

    expect(existing.status).toBe(404);
    expect(existing.body).toEqual(missing.body);
  });

  it('When an outsider lists their teams, then this team is not among them', async () => {
    const response = await request(testApp.app).get('/api/teams').set('Authorization', actors.outsider.auth);

    expect(response.body).toEqual([{ id: expect.any(String), name: 'Elsewhere', role: 'owner' }]);
  });

  it('When a team route is called without a token, then the answer is 401, not 404', async () => {
    const response = await request(testApp.app).get(`/api/teams/${teamId}/members`);

    expect(response.status).toBe(401);
    expect(response.body.code).toBe('AUTH_REQUIRED');
  });
});
