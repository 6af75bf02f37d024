import { checkEquation, checkToJson, combineReactions, combineToJson } from '@tallus/chem';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getReactionSet } from '../../apps/api/src/reaction-sets/get-reaction-set';
import { addReaction, createSet, PUBLISHED } from './support/reaction-sets';
import { createTeam, registerUser, startTestApp, type SignedInUser, type TestApp } from './support/test-app';

let testApp: TestApp;
let owner: SignedInUser;
let teamId: string;

const send = (method: 'get' | 'post' | 'patch' | 'delete', path: string, body?: object) => {
  const test = request(testApp.app)[method](path).set('Authorization', owner.auth);
  return body ? test.send(body) : test;
};

describe('Reaction sets, reactions and net reactions', () => {
  beforeAll(async () => {
    testApp = await startTestApp();
    owner = await registerUser(testApp.app, 'owner');
    teamId = await createTeam(testApp.app, owner, 'Chemistry Team');
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('When a published reaction is saved, then the stored check equals libs/chem checkEquation of the same text (R15, Reitner & Thiel 2011, Encyclopedia of Geobiology)', async () => {
    const setId = await createSet(testApp.app, owner, teamId);
    const { reaction } = await addReaction(testApp.app, owner, setId, { name: 'Pyrite by O2', equation: PUBLISHED.pyriteToFerrous });

    const engine = checkToJson(checkEquation(PUBLISHED.pyriteToFerrous));
    const stored = (await send('get', `/api/reaction-sets/${setId}`).expect(200)).body.reactions[0].result;
    expect(stored.status).toBe(engine.status);
    expect(stored.residuals).toEqual(engine.residuals);
    expect(stored.protonBudget).toEqual(engine.protonBudget);
    expect(stored.electrons).toEqual({ byElement: engine.electrons, transferred: engine.electronsTransferred, o2Demand: engine.o2Demand });
    expect(stored.protonBudget.perMole).toBe('2');
    expect(reaction.result).toEqual(stored);
  });

  it('When a set is read over HTTP (reactions serialised by PostgreSQL), then the answer equals the object form of the use case', async () => {
    const setId = await createSet(testApp.app, owner, teamId);
    await addReaction(testApp.app, owner, setId, { name: 'R20', equation: PUBLISHED.ferrousToHydroxide });
    await addReaction(testApp.app, owner, setId, { name: 'open', equation: 'FeS2 + O2 -> Fe^2+ + SO4^2- + H+ + Fe^3+ + H2O' });
    await addReaction(testApp.app, owner, setId, { name: 'typo', equation: 'Ca2+ -> Ca' });

    const overHttp = (await send('get', `/api/reaction-sets/${setId}`).expect(200)).body;

    expect(overHttp).toEqual(await getReactionSet(testApp.orm.em.fork(), setId));
    expect(overHttp.statusCounts).toEqual({ balanced: 1, unbalanced: 0, open: 1, impossible: 0, invalid: 1 });
  });

  it('When a read set is changed (edit, reorder, delete), then the next read shows the change, not the cached reactions', async () => {
    const setId = await createSet(testApp.app, owner, teamId);
    const first = await addReaction(testApp.app, owner, setId, { name: 'R20', equation: PUBLISHED.ferrousToHydroxide });
    await addReaction(testApp.app, owner, setId, { name: 'R15', equation: PUBLISHED.pyriteToFerrous });
    const read = async () => (await send('get', `/api/reaction-sets/${setId}`).expect(200)).body;
    await read();

    await send('patch', `/api/reactions/${first.reaction.id}`, { name: 'R20 renamed', version: first.reaction.version }).expect(200);
    expect((await read()).reactions.map((reaction: { name: string }) => reaction.name)).toEqual(['R20 renamed', 'R15']);

    const ids = (await read()).reactions.map((reaction: { id: string }) => reaction.id);
    await send('post', `/api/reaction-sets/${setId}/reorder`, { reactionIds: [...ids].reverse() }).expect(200);
    expect((await read()).reactions.map((reaction: { name: string }) => reaction.name)).toEqual(['R15', 'R20 renamed']);

    await send('delete', `/api/reactions/${first.reaction.id}`).expect(200);
    const after = await read();
    expect(after.reactions.map((reaction: { name: string }) => reaction.name)).toEqual(['R15']);
    expect(after.reactionCount).toBe(1);
  });

  it('When an equation does not parse, then the reaction is saved with status invalid, its text kept, and the error with its span', async () => {
    const setId = await createSet(testApp.app, owner, teamId);

    const { reaction } = await addReaction(testApp.app, owner, setId, { name: 'Typo', equation: 'CaCO3 + H+ -> Ca2+ + HCO3-' });

    expect(reaction.result).toMatchObject({ status: 'invalid', error: { code: 'FORMULA_AMBIGUOUS_CHARGE', field: 'equation', span: { start: 14, end: 18 } } });
    const detail = (await send('get', `/api/reaction-sets/${setId}`).expect(200)).body;
    expect(detail.reactions[0].equation).toBe('CaCO3 + H+ -> Ca2+ + HCO3-');
    expect(detail.statusCounts).toEqual({ balanced: 0, unbalanced: 0, open: 0, impossible: 0, invalid: 1 });
  });

  it('When pyrite→Fe2+ and Fe2+→Fe(OH)3 are combined cancelling Fe2+, then the net reaction is R16 with 4 H+ per FeS2 (Itasca report to Colorado DRMS, eq. 3.1)', async () => {
    const setId = await createSet(testApp.app, owner, teamId);
    const first = await addReaction(testApp.app, owner, setId, { name: 'R15', equation: PUBLISHED.pyriteToFerrous });
    const second = await addReaction(testApp.app, owner, setId, { name: 'R20', equation: PUBLISHED.ferrousToHydroxide });

    const response = await send('post', `/api/reaction-sets/${setId}/net-reactions`, {
      name: 'Pyrite to ferric hydroxide',
      reactions: [{ reactionId: first.reaction.id }, { reactionId: second.reaction.id }],
      cancel: ['Fe^2+'],
    }).expect(201);

    const engine = combineToJson(combineReactions({ reactions: [{ equation: PUBLISHED.pyriteToFerrous }, { equation: PUBLISHED.ferrousToHydroxide }], cancel: ['Fe^2+'] }));
    expect(response.body.netReaction.result).toMatchObject({ status: 'combined', multipliers: ['1', '1/4'], equation: engine.equation });
    const terms = response.body.netReaction.result.terms.map((term: { formula: string; side: string; coefficient: string }) => `${term.side} ${term.coefficient} ${term.formula}`);
    expect(terms.sort()).toEqual(['left 1 FeS2', 'left 15/4 O2', 'left 7/2 H2O', 'right 1 Fe(OH)3', 'right 2 SO4^2-', 'right 4 H+']);
    expect(response.body.netReaction.result.protonBudget.perMole).toBe('4');

    const other = await createSet(testApp.app, owner, teamId);
    const foreign = await send('post', `/api/reaction-sets/${other}/net-reactions`, { name: 'Bad', reactions: [{ reactionId: first.reaction.id }], cancel: [] });
    expect([foreign.status, foreign.body.code, foreign.body.issues[0].path]).toEqual([400, 'NET_REACTION_UNKNOWN_REACTION', ['reactions', 0, 'reactionId']]);

    const afterDelete = await send('delete', `/api/reactions/${second.reaction.id}`).expect(200);
    expect(afterDelete.body.netReactions[0].reactions).toEqual([{ reactionId: first.reaction.id, multiplier: null }]);
  });

  it('When reactions are reordered, then the set lists them in the new order; a list that is not the set answers 409', async () => {
    const setId = await createSet(testApp.app, owner, teamId);
    const ids: string[] = [];
    for (const [name, equation] of Object.entries(PUBLISHED)) ids.push((await addReaction(testApp.app, owner, setId, { name, equation })).reaction.id);

    const reordered = await send('post', `/api/reaction-sets/${setId}/reorder`, { reactionIds: [...ids].reverse() }).expect(200);

    expect(reordered.body.reactions.map((reaction: { id: string; position: number }) => [reaction.id, reaction.position])).toEqual([...ids].reverse().map((id, index) => [id, index]));
    const mismatch = await send('post', `/api/reaction-sets/${setId}/reorder`, { reactionIds: ids.slice(1) });
    expect([mismatch.status, mismatch.body.code]).toEqual([409, 'REORDER_MISMATCH']);
  });

  it('When a PATCH carries an old version, then it answers 409 VERSION_CONFLICT and changes nothing', async () => {
    const setId = await createSet(testApp.app, owner, teamId, 'Original name');
    const { reaction } = await addReaction(testApp.app, owner, setId, { name: 'Calcite', equation: PUBLISHED.calcite });
    const before = (await send('get', `/api/reaction-sets/${setId}`).expect(200)).body;
    await send('patch', `/api/reaction-sets/${setId}`, { name: 'First edit', version: before.version }).expect(200);

    const stale = await send('patch', `/api/reaction-sets/${setId}`, { name: 'Second edit', version: before.version });
    const staleReaction = await send('patch', `/api/reactions/${reaction.id}`, { name: 'Stale', version: reaction.version + 5 });

    expect([stale.status, stale.body.code]).toEqual([409, 'VERSION_CONFLICT']);
    expect([staleReaction.status, staleReaction.body.code]).toEqual([409, 'VERSION_CONFLICT']);
    const after = (await send('get', `/api/reaction-sets/${setId}`).expect(200)).body;
    expect(after.name).toBe('First edit');
    expect(after.reactions[0].name).toBe('Calcite');
  });

  it('When sets are listed, then each has counts by balance status and the state filter applies', async () => {
    const setId = await createSet(testApp.app, owner, teamId, 'Counted');
    await addReaction(testApp.app, owner, setId, { name: 'ok', equation: PUBLISHED.calcite });
    await addReaction(testApp.app, owner, setId, { name: 'off', equation: 'CaCO3 + 3 H+ -> Ca^2+ + HCO3-' });
    await send('post', `/api/reaction-sets/${setId}/submit`).expect(200);

    const inReview = (await send('get', `/api/teams/${teamId}/reaction-sets?state=in_review`).expect(200)).body;

    expect(inReview).toEqual([expect.objectContaining({ id: setId, reactionCount: 2, statusCounts: { balanced: 1, unbalanced: 1, open: 0, impossible: 0, invalid: 0 } })]);
    expect((await send('get', `/api/teams/${teamId}/reaction-sets?state=melted`)).status).toBe(400);
    const activity = (await send('get', `/api/teams/${teamId}/activity?limit=3`).expect(200)).body;
    expect(activity[0]).toMatchObject({ action: 'reaction_set.submitted', entityId: setId, actor: { id: owner.id } });
  });
});
