import type { ReactionSetDetail } from '@tallus/contracts';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { getReactionSet } from '../../apps/api/src/reaction-sets/get-reaction-set';
import { addReaction, createSet, PUBLISHED } from './support/reaction-sets';
import { addMember, createTeam, registerUser, startTestApp, type SignedInUser, type TestApp } from './support/test-app';

let testApp: TestApp;
let owner: SignedInUser;
let reviewer: SignedInUser;
let editor: SignedInUser;
let teamId: string;
/** The other team's copy of the published set, made by the library test. */
let copy: ReactionSetDetail | undefined;
let stranger: SignedInUser;

const get = (user: SignedInUser, path: string) => request(testApp.app).get(path).set('Authorization', user.auth);
const post = (user: SignedInUser, path: string, body: object = {}) => request(testApp.app).post(path).set('Authorization', user.auth).send(body);

/** Waits until the fake SMTP server holds `count` messages (mail is sent after the step commits). */
async function messagesFor(address: string, count: number) {
  for (let attempt = 0; attempt < 50; attempt++) {
    const found = testApp.smtp.messages().filter((message) => message.to.includes(address));
    if (found.length >= count) return found;
    await new Promise((resolve) => setTimeout(resolve, 20));
  }
  return testApp.smtp.messages().filter((message) => message.to.includes(address));
}

describe('Review journey', () => {
  beforeAll(async () => {
    testApp = await startTestApp();
    owner = await registerUser(testApp.app, 'owner');
    teamId = await createTeam(testApp.app, owner, 'Review Team');
    reviewer = await registerUser(testApp.app, 'reviewer');
    editor = await registerUser(testApp.app, 'editor');
    await addMember(testApp, teamId, reviewer, 'reviewer');
    await addMember(testApp, teamId, editor, 'editor');
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('When a draft is submitted, returned with a comment, resubmitted, approved and edited, then revision 1 stays as vetted and the set is a draft again', async () => {
    const setId = await createSet(testApp.app, editor, teamId, 'Sulfide oxidation');
    const { reaction } = await addReaction(testApp.app, editor, setId, { name: 'Pyrite by O2', equation: PUBLISHED.pyriteToFerrous });

    const empty = await createSet(testApp.app, editor, teamId, 'Empty');
    expect((await post(editor, `/api/reaction-sets/${empty}/submit`)).body.code).toBe('REVIEW_EMPTY_SET');

    const submitted = await post(editor, `/api/reaction-sets/${setId}/submit`, { comment: 'Ready for a look' }).expect(200);
    expect(submitted.body.set.reviewState).toBe('in_review');
    expect(submitted.body.mail.sent.sort()).toEqual([owner.email, reviewer.email].sort());

    const locked = await request(testApp.app).patch(`/api/reactions/${reaction.id}`).set('Authorization', editor.auth).send({ name: 'x', version: reaction.version });
    expect([locked.status, locked.body.code]).toEqual([409, 'REVIEW_LOCKED']);
    const selfApproval = await post(editor, `/api/reaction-sets/${setId}/approve`);
    expect(selfApproval.status).toBe(403);
    expect((await post(reviewer, `/api/reaction-sets/${setId}/return`, { comment: '  ' })).status).toBe(400);

    const returned = await post(reviewer, `/api/reaction-sets/${setId}/return`, { comment: 'Cite the source of R15, please.' }).expect(200);
    expect(returned.body.set.reviewState).toBe('returned');
    expect(returned.body.set.comments.map((comment: { action: string }) => comment.action)).toEqual(['submitted', 'returned']);
    expect(returned.body.mail.sent).toEqual([editor.email]);

    await request(testApp.app)
      .patch(`/api/reactions/${reaction.id}`)
      .set('Authorization', editor.auth)
      .send({ citation: 'Reitner & Thiel 2011, Encyclopedia of Geobiology', version: reaction.version })
      .expect(200);
    await post(editor, `/api/reaction-sets/${setId}/submit`).expect(200);
    const approved = await post(owner, `/api/reaction-sets/${setId}/approve`, { comment: 'Good.' }).expect(200);
    expect(approved.body.set).toMatchObject({ reviewState: 'vetted', currentRevision: 1 });

    const revisionBefore = (await get(editor, `/api/reaction-sets/${setId}/revisions/1`).expect(200)).body;
    await addReaction(testApp.app, editor, setId, { name: 'Calcite', equation: PUBLISHED.calcite, kind: 'dissolution' });

    const after = (await get(editor, `/api/reaction-sets/${setId}`).expect(200)).body;
    expect(after).toMatchObject({ reviewState: 'draft', currentRevision: 1, reactionCount: 2 });
    const revisionAfter = (await get(editor, `/api/reaction-sets/${setId}/revisions/1`).expect(200)).body;
    expect(revisionAfter).toEqual(revisionBefore);
    expect(revisionAfter.reactions).toHaveLength(1);
    expect(revisionAfter.reactions[0].citation).toBe('Reitner & Thiel 2011, Encyclopedia of Geobiology');
    expect(revisionAfter.species.map((species: { formula: string }) => species.formula)).toEqual(expect.arrayContaining(['FeS2', 'O2', 'H2O', 'Fe^2+', 'SO4^2-', 'H+']));
    expect(revisionAfter.species.find((species: { formula: string }) => species.formula === 'FeS2').oxidationStates).toEqual({ Fe: '2', S: '-1' });
    const revisions = (await get(editor, `/api/reaction-sets/${setId}/revisions`).expect(200)).body;
    expect(revisions).toEqual([expect.objectContaining({ number: 1, reactionCount: 1, vettedBy: { id: owner.id, displayName: owner.displayName } })]);
    expect((await get(editor, `/api/reaction-sets/${setId}/revisions/2`)).status).toBe(404);
  });

  it('When a set is submitted and decided, then the fake SMTP server receives the notices with set, team, comment and link', async () => {
    const setId = await createSet(testApp.app, editor, teamId, 'Carbonate buffering');
    await addReaction(testApp.app, editor, setId, { name: 'Calcite', equation: PUBLISHED.calcite, kind: 'dissolution' });

    await post(editor, `/api/reaction-sets/${setId}/submit`, { comment: 'Please check the calcite step.' }).expect(200);
    await post(reviewer, `/api/reaction-sets/${setId}/return`, { comment: 'Add dolomite too.' }).expect(200);

    const link = `http://tallus.test:4300/teams/${teamId}/reaction-sets/${setId}`;
    const toReviewer = (await messagesFor(reviewer.email, 1)).find((message) => message.subject.includes('Carbonate buffering'));
    expect(toReviewer?.subject).toBe('Review requested: Carbonate buffering (Review Team)');
    expect(toReviewer?.text).toContain('Please check the calcite step.');
    expect(toReviewer?.text).toContain(link);
    const toEditor = (await messagesFor(editor.email, 1)).find((message) => message.subject.includes('Carbonate buffering'));
    expect(toEditor?.subject).toBe('Returned with comments: Carbonate buffering (Review Team)');
    expect(toEditor?.text).toContain('Add dolomite too.');
    expect(toEditor?.text).toContain(link);
    expect(testApp.smtp.messages().some((message) => message.to.includes(editor.email) && message.subject.startsWith('Review requested: Carbonate'))).toBe(false);
  });

  it('When a vetted set is published and copied by another team, then every user sees it in the library and the copy records its origin', async () => {
    const setId = await createSet(testApp.app, editor, teamId, 'Published set');
    await addReaction(testApp.app, editor, setId, { name: 'Forsterite', equation: PUBLISHED.forsterite, kind: 'dissolution' });
    expect((await post(owner, `/api/reaction-sets/${setId}/publish`)).body.code).toBe('PUBLISH_NOT_VETTED');
    await post(editor, `/api/reaction-sets/${setId}/submit`).expect(200);
    await post(reviewer, `/api/reaction-sets/${setId}/approve`).expect(200);
    expect((await post(reviewer, `/api/reaction-sets/${setId}/publish`)).status).toBe(403);

    const publication = (await post(owner, `/api/reaction-sets/${setId}/publish`).expect(201)).body;
    stranger = await registerUser(testApp.app, 'stranger');
    const otherTeam = await createTeam(testApp.app, stranger, 'Other Team');

    const library = (await get(stranger, '/api/library').expect(200)).body;
    expect(library).toContainEqual(expect.objectContaining({ id: publication.id, teamName: 'Review Team', setName: 'Published set', revision: 1, reactionCount: 1 }));
    const preview = (await get(stranger, `/api/library/${publication.id}`).expect(200)).body;
    expect(preview.snapshot.reactions[0].equation).toBe(PUBLISHED.forsterite);
    expect((await post(stranger, `/api/library/${publication.id}/copy`, { teamId })).status).toBe(404);

    copy = (await post(stranger, `/api/library/${publication.id}/copy`, { teamId: otherTeam }).expect(201)).body;
    expect(copy).toMatchObject({ teamId: otherTeam, reviewState: 'draft', currentRevision: 0, name: 'Published set' });
    expect(copy!.copiedFrom).toEqual({ publicationId: publication.id, teamName: 'Review Team', setName: 'Published set', revision: 1 });
    expect(copy!.reactions[0]?.result.protonBudget?.perMole).toBe('-4');
  });

  it('When sets with comments, revisions, a publication, a net reaction and a copy origin are read over HTTP, then each answer equals the object form of the use case', async () => {
    // The GET builds its answer in SQL (one statement and the reactions cache); getReactionSet builds it from entities.
    expect(copy).toBeDefined();
    const [reaction] = copy!.reactions;
    await post(stranger, `/api/reaction-sets/${copy!.id}/net-reactions`, { name: 'Doubled', reactions: [{ reactionId: reaction!.id, multiplier: '2' }], cancel: [] }).expect(201);
    const ownSets = (await get(owner, `/api/teams/${teamId}/reaction-sets`).expect(200)).body as Array<{ id: string }>;
    const reads = [...ownSets.map((set) => ({ user: owner, id: set.id })), { user: stranger, id: copy!.id }];

    for (const { user, id } of reads) {
      const overHttp = (await get(user, `/api/reaction-sets/${id}`).expect(200)).body;
      expect(overHttp).toEqual(await getReactionSet(testApp.orm.em.fork(), id));
    }
    const answers = await Promise.all(reads.map(({ user, id }) => get(user, `/api/reaction-sets/${id}`).expect(200)));
    const seen = answers.map((answer) => answer.body as { comments: unknown[]; revisions: Array<{ publicationId: string | null }>; netReactions: unknown[]; copiedFrom: unknown });
    expect(seen.some((set) => set.comments.length >= 4 && set.revisions.length >= 1)).toBe(true);
    expect(seen.some((set) => set.revisions.some((revision) => revision.publicationId !== null))).toBe(true);
    expect(seen.some((set) => set.netReactions.length === 1 && set.copiedFrom !== null)).toBe(true);
  });

  it('When a set is read again with its entity tag, then the answer is 304 until the set changes', async () => {
    const setId = await createSet(testApp.app, editor, teamId, 'Tagged set');
    await addReaction(testApp.app, editor, setId, { name: 'Forsterite', equation: PUBLISHED.forsterite, kind: 'dissolution' });
    const first = await get(editor, `/api/reaction-sets/${setId}`).expect(200);
    const etag = first.headers['etag'] as string;

    await get(editor, `/api/reaction-sets/${setId}`).set('If-None-Match', etag).expect(304);
    await request(testApp.app).patch(`/api/reaction-sets/${setId}`).set('Authorization', editor.auth).send({ description: 'Changed', version: first.body.version }).expect(200);
    const changed = await get(editor, `/api/reaction-sets/${setId}`).set('If-None-Match', etag).expect(200);
    expect(changed.headers['etag']).not.toBe(etag);
    expect(changed.body.description).toBe('Changed');
  });

  it('When a published set is renamed, then the library still lists and shows the name it was published under', async () => {
    const setId = await createSet(testApp.app, editor, teamId, 'Name at publication');
    await addReaction(testApp.app, editor, setId, { name: 'Forsterite', equation: PUBLISHED.forsterite, kind: 'dissolution' });
    await post(editor, `/api/reaction-sets/${setId}/submit`).expect(200);
    await post(reviewer, `/api/reaction-sets/${setId}/approve`).expect(200);
    const publication = (await post(owner, `/api/reaction-sets/${setId}/publish`).expect(201)).body;
    expect(publication.setName).toBe('Name at publication');

    const live = (await get(editor, `/api/reaction-sets/${setId}`).expect(200)).body;
    await request(testApp.app).patch(`/api/reaction-sets/${setId}`).set('Authorization', editor.auth).send({ name: 'Renamed later', version: live.version }).expect(200);

    const library = (await get(owner, '/api/library').expect(200)).body;
    expect(library).toContainEqual(expect.objectContaining({ id: publication.id, setId, setName: 'Name at publication' }));
    expect((await get(owner, `/api/library/${publication.id}`).expect(200)).body.setName).toBe('Name at publication');
  });
});
