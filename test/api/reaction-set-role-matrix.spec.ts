import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { addReaction, createSet, PUBLISHED } from './support/reaction-sets';
import { enrolMatrixTeam, expectMatrixAnswer, matrixCases, type Actor } from './support/role-matrix';
import { startTestApp, type SignedInUser, type TestApp } from './support/test-app';


let testApp: TestApp;
const actors = {} as Record<Actor, SignedInUser>;
/** A second editor who writes and submits what the reviewers decide on. */
let author: SignedInUser;
let teamId: string;

const app = () => testApp.app;
const call = (method: 'get' | 'post' | 'patch' | 'delete', path: string, actor: SignedInUser, body?: object) => {
  const test = request(app())[method](path).set('Authorization', actor.auth);
  return body ? test.send(body) : test;
};

/** A fresh set by the author with one reaction; ids of the set and the reaction. */
async function setWithReaction(): Promise<{ setId: string; reactionId: string; reactionVersion: number }> {
  const setId = await createSet(app(), author, teamId, 'Matrix set');
  const { reaction } = await addReaction(app(), author, setId, { name: 'Pyrite by O2', equation: PUBLISHED.pyriteToFerrous });
  return { setId, reactionId: reaction.id, reactionVersion: reaction.version };
}

async function submittedSet(): Promise<string> {
  const { setId } = await setWithReaction();
  await call('post', `/api/reaction-sets/${setId}/submit`, author).expect(200);
  return setId;
}

async function vettedSet(): Promise<string> {
  const setId = await submittedSet();
  await call('post', `/api/reaction-sets/${setId}/approve`, actors.owner).expect(200);
  return setId;
}

async function publication(): Promise<string> {
  const setId = await vettedSet();
  return (await call('post', `/api/reaction-sets/${setId}/publish`, actors.owner).expect(201)).body.id;
}

const importFile = JSON.stringify({ format: 'tallus.reaction-set', version: 1, set: { name: 'Imported' }, reactions: [{ name: 'Calcite', kind: 'dissolution', equation: PUBLISHED.calcite }] });

/** Each new route: how to call it as an actor, after arranging what it needs. */
const ROUTES: Record<string, (actor: SignedInUser) => Promise<request.Response>> = {
  'GET /species/builtin': (actor) => call('get', '/api/species/builtin', actor),
  'GET /teams/:teamId/species': (actor) => call('get', `/api/teams/${teamId}/species`, actor),
  'POST /teams/:teamId/species': (actor) => call('post', `/api/teams/${teamId}/species`, actor, { name: `Olivine ${crypto.randomUUID()}`, formula: `Mg0.${Math.floor(Math.random() * 9e5) + 1e5}SiO4`, phase: 'mineral' }),
  'GET /species/:id': async (actor) => call('get', `/api/species/${await speciesId()}`, actor),
  'PATCH /species/:id': async (actor) => call('patch', `/api/species/${await speciesId()}`, actor, { notes: 'checked', version: 1 }),
  'DELETE /species/:id': async (actor) => call('delete', `/api/species/${await speciesId()}`, actor),
  'GET /teams/:teamId/reaction-sets': (actor) => call('get', `/api/teams/${teamId}/reaction-sets?state=draft`, actor),
  'POST /teams/:teamId/reaction-sets': (actor) => call('post', `/api/teams/${teamId}/reaction-sets`, actor, { name: 'New set' }),
  'GET /reaction-sets/:id': async (actor) => call('get', `/api/reaction-sets/${(await setWithReaction()).setId}`, actor),
  'PATCH /reaction-sets/:id': async (actor) => call('patch', `/api/reaction-sets/${(await setWithReaction()).setId}`, actor, { site: 'Pit wall', version: 2 }),
  'DELETE /reaction-sets/:id': async (actor) => call('delete', `/api/reaction-sets/${(await setWithReaction()).setId}`, actor),
  'POST /reaction-sets/:id/reactions': async (actor) => call('post', `/api/reaction-sets/${(await setWithReaction()).setId}/reactions`, actor, { name: 'Calcite', kind: 'dissolution', equation: PUBLISHED.calcite }),
  'PATCH /reactions/:id': async (actor) => {
    const { reactionId, reactionVersion } = await setWithReaction();
    return call('patch', `/api/reactions/${reactionId}`, actor, { notes: 'checked', version: reactionVersion });
  },
  'DELETE /reactions/:id': async (actor) => call('delete', `/api/reactions/${(await setWithReaction()).reactionId}`, actor),
  'POST /reaction-sets/:id/reorder': async (actor) => {
    const { setId, reactionId } = await setWithReaction();
    return call('post', `/api/reaction-sets/${setId}/reorder`, actor, { reactionIds: [reactionId] });
  },
  'POST /reaction-sets/:id/net-reactions': async (actor) => {
    const { setId, reactionId } = await setWithReaction();
    return call('post', `/api/reaction-sets/${setId}/net-reactions`, actor, { name: 'Net', reactions: [{ reactionId }], cancel: [] });
  },
  'PATCH /net-reactions/:id': async (actor) => call('patch', `/api/net-reactions/${await netReactionId()}`, actor, { name: 'Renamed', version: 1 }),
  'DELETE /net-reactions/:id': async (actor) => call('delete', `/api/net-reactions/${await netReactionId()}`, actor),
  'POST /reaction-sets/:id/submit': async (actor) => call('post', `/api/reaction-sets/${(await setWithReaction()).setId}/submit`, actor),
  'POST /reaction-sets/:id/approve': async (actor) => call('post', `/api/reaction-sets/${await submittedSet()}/approve`, actor),
  'POST /reaction-sets/:id/return': async (actor) => call('post', `/api/reaction-sets/${await submittedSet()}/return`, actor, { comment: 'More detail' }),
  'GET /reaction-sets/:id/revisions': async (actor) => call('get', `/api/reaction-sets/${await vettedSet()}/revisions`, actor),
  'GET /reaction-sets/:id/revisions/:n': async (actor) => call('get', `/api/reaction-sets/${await vettedSet()}/revisions/1`, actor),
  'POST /reaction-sets/:id/publish': async (actor) => call('post', `/api/reaction-sets/${await vettedSet()}/publish`, actor),
  'GET /library': (actor) => call('get', '/api/library', actor),
  'GET /library/:publicationId': async (actor) => call('get', `/api/library/${await publication()}`, actor),
  'POST /library/:publicationId/copy': async (actor) => call('post', `/api/library/${await publication()}/copy`, actor, { teamId }),
  'GET /reaction-sets/:id/export': async (actor) => call('get', `/api/reaction-sets/${(await setWithReaction()).setId}/export?format=csv`, actor),
  'POST /teams/:teamId/reaction-sets/import': (actor) =>
    request(app()).post(`/api/teams/${teamId}/reaction-sets/import`).set('Authorization', actor.auth).attach('file', Buffer.from(importFile), 'set.json'),
  'GET /teams/:teamId/activity': (actor) => call('get', `/api/teams/${teamId}/activity?limit=5`, actor),
  'POST /chem/balance': (actor) => call('post', '/api/chem/balance', actor, { equation: 'H2 + O2 -> H2O' }),
};

async function speciesId(): Promise<string> {
  const response = await call('post', `/api/teams/${teamId}/species`, author, { name: `Sample ${crypto.randomUUID()}`, formula: `Na0.${Math.floor(Math.random() * 9e5) + 1e5}Cl`, phase: 'mineral' }).expect(201);
  return response.body.id;
}

async function netReactionId(): Promise<string> {
  const { setId, reactionId } = await setWithReaction();
  const response = await call('post', `/api/reaction-sets/${setId}/net-reactions`, author, { name: 'Net', reactions: [{ reactionId }], cancel: [] }).expect(201);
  return response.body.netReaction.id;
}

const READ = { owner: 200, reviewer: 200, editor: 200, viewer: 200, outsider: 404 };
const ANYONE = { owner: 200, reviewer: 200, editor: 200, viewer: 200, outsider: 200 };
const write = (status: number) => ({ owner: status, reviewer: status, editor: status, viewer: 403, outsider: 404 });
const DECIDE = { owner: 200, reviewer: 200, editor: 403, viewer: 403, outsider: 404 };

/** Expected status per route and actor (DESIGN.md §5: viewers read, editors write drafts, reviewers decide, owners publish). */
const MATRIX: Record<keyof typeof ROUTES, Record<Actor, number>> = {
  'GET /species/builtin': ANYONE,
  'GET /teams/:teamId/species': READ,
  'POST /teams/:teamId/species': write(201),
  'GET /species/:id': READ,
  'PATCH /species/:id': write(200),
  'DELETE /species/:id': write(204),
  'GET /teams/:teamId/reaction-sets': READ,
  'POST /teams/:teamId/reaction-sets': write(201),
  'GET /reaction-sets/:id': READ,
  'PATCH /reaction-sets/:id': write(200),
  'DELETE /reaction-sets/:id': write(204),
  'POST /reaction-sets/:id/reactions': write(201),
  'PATCH /reactions/:id': write(200),
  'DELETE /reactions/:id': write(200),
  'POST /reaction-sets/:id/reorder': write(200),
  'POST /reaction-sets/:id/net-reactions': write(201),
  'PATCH /net-reactions/:id': write(200),
  'DELETE /net-reactions/:id': write(200),
  'POST /reaction-sets/:id/submit': write(200),
  'POST /reaction-sets/:id/approve': DECIDE,
  'POST /reaction-sets/:id/return': DECIDE,
  'GET /reaction-sets/:id/revisions': READ,
  'GET /reaction-sets/:id/revisions/:n': READ,
  'POST /reaction-sets/:id/publish': { owner: 201, reviewer: 403, editor: 403, viewer: 403, outsider: 404 },
  'GET /library': ANYONE,
  'GET /library/:publicationId': ANYONE,
  'POST /library/:publicationId/copy': write(201),
  'GET /reaction-sets/:id/export': READ,
  'POST /teams/:teamId/reaction-sets/import': write(201),
  'GET /teams/:teamId/activity': READ,
  'POST /chem/balance': ANYONE,
};

const CASES = matrixCases(MATRIX);

describe('Reaction-set, species, review, library and chemistry routes by role', () => {
  beforeAll(async () => {
    testApp = await startTestApp();
    ({ teamId, author } = await enrolMatrixTeam(testApp, actors, 'Matrix Team'));
  });

  afterAll(async () => {
    await testApp.close();
  });

  it.each(CASES)('When %s is called by the %s, then the status is %i', async (route, actor, status) => {
    const response = await ROUTES[route]!(actors[actor]);

    expectMatrixAnswer(response, status);
  });

  it('When an outsider asks for an existing set and a missing one, then both answers are identical', async () => {
    const { setId } = await setWithReaction();

    const existing = await call('get', `/api/reaction-sets/${setId}`, actors.outsider);
    const missing = await call('get', `/api/reaction-sets/${crypto.randomUUID()}`, actors.outsider);

    expect(existing.status).toBe(404);
    expect(existing.body).toEqual(missing.body);
  });

  it('When a new route is called without a token, then the answer is 401', async () => {
    const responses = await Promise.all(['/api/species/builtin', '/api/library', `/api/teams/${teamId}/reaction-sets`].map((path) => request(app()).get(path)));

    expect(responses.map((response) => response.status)).toEqual([401, 401, 401]);
  });
});
