import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { provideZonelessChangeDetection } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import type { NetReaction, Reaction, ReactionSetDetail } from '@tallus/contracts';

import { ReactionSetStore } from './reaction-set-store';

function reaction(id: string, position: number, status: Reaction['result']['status'] = 'balanced'): Reaction {
  return { id, setId: 's1', position, name: id, kind: 'oxidation', equation: 'H2 + O2 -> H2O', reference: null, citation: '', notes: '', version: 1, updatedAt: '', result: { status } } as Reaction;
}

function set(reactions: Reaction[]): ReactionSetDetail {
  return {
    id: 's1', teamId: 't1', name: 'Set', description: '', site: '', reviewState: 'draft', currentRevision: 0, version: 3,
    createdAt: '', updatedAt: '', updatedBy: null, submittedBy: null, copiedFrom: null, reactionCount: reactions.length,
    statusCounts: { balanced: reactions.length, unbalanced: 0, open: 0, impossible: 0, invalid: 0 },
    reactions, netReactions: [], comments: [], revisions: [],
  };
}

describe('ReactionSetStore', () => {
  let store: ReactionSetStore;
  let http: HttpTestingController;

  beforeEach(() => {
    TestBed.configureTestingModule({
      providers: [provideZonelessChangeDetection(), provideHttpClient(), provideHttpClientTesting(), ReactionSetStore],
    });
    store = TestBed.inject(ReactionSetStore);
    http = TestBed.inject(HttpTestingController);
    store.load('s1').subscribe();
    http.expectOne('/api/reaction-sets/s1').flush(set([reaction('a', 0), reaction('b', 1), reaction('c', 2)]));
  });

  afterEach(() => http.verify());

  it('moves a reaction at once and sends the new order', () => {
    store.move(2, 0).subscribe();
    expect(store.reactions().map((entry) => entry.id)).toEqual(['c', 'a', 'b']);
    const request = http.expectOne('/api/reaction-sets/s1/reorder');
    expect(request.request.body).toEqual({ reactionIds: ['c', 'a', 'b'] });
    request.flush(set([reaction('c', 0), reaction('a', 1), reaction('b', 2)]));
    expect(store.isBusy()).toBe(false);
  });

  it('puts the server’s order back when the move is refused', () => {
    store.move(0, 1).subscribe({ error: () => undefined });
    http.expectOne('/api/reaction-sets/s1/reorder').flush({ code: 'REORDER_MISMATCH', title: 'Conflict', status: 409, detail: 'Reload' }, { status: 409, statusText: 'Conflict' });
    expect(store.reactions().map((entry) => entry.id)).toEqual(['a', 'b', 'c']);
  });

  it('replaces a saved reaction, takes the new set version and recounts the statuses', () => {
    store.saveReaction('b', { equation: 'H2 + O2 -> H2O', version: 1 }).subscribe();
    http.expectOne('/api/reactions/b').flush({ reaction: reaction('b', 1, 'unbalanced'), set: { ...set([]), version: 4 }, netReactions: [] });
    expect(store.set()?.version).toBe(4);
    expect(store.set()?.statusCounts).toMatchObject({ balanced: 2, unbalanced: 1 });
    expect(store.set()?.reactionCount).toBe(3);
  });

  it('loads the explicit oxidation states of the built-in and the team catalogue, the team winning for a formula', () => {
    expect(store.oxidationStates()).toBeUndefined();
    store.loadOxidationStates('t1').subscribe();
    http.expectOne('/api/species/builtin').flush([{ formula: 'FeS', oxidationStates: { Fe: '2', S: '-2' } }, { formula: 'CaCO3', oxidationStates: null }]);
    http.expectOne('/api/teams/t1/species').flush([{ formula: 'FeS', oxidationStates: { Fe: '20/9', S: '-2' } }]);
    expect(store.oxidationStates()).toEqual({ FeS: { Fe: '20/9', S: '-2' } });
  });

  it('saves a changed net reaction with the version it was read at and replaces it in the set', () => {
    const net = { id: 'n1', setId: 's1', name: 'Net', reactions: [], cancel: [], result: { status: 'combined' }, version: 2, updatedAt: '' } as unknown as NetReaction;
    store.load('s1').subscribe();
    http.expectOne('/api/reaction-sets/s1').flush({ ...set([reaction('a', 0)]), netReactions: [net] });

    store.saveNetReaction(net, { name: 'Renamed' }).subscribe();
    const request = http.expectOne('/api/net-reactions/n1');
    expect([request.request.method, request.request.body]).toEqual(['PATCH', { name: 'Renamed', version: 2 }]);
    request.flush({ netReaction: { ...net, name: 'Renamed', version: 3 }, set: { ...set([]), version: 5 } });

    expect(store.set()?.netReactions.map((entry) => [entry.name, entry.version])).toEqual([['Renamed', 3]]);
    expect(store.set()?.version).toBe(5);
  });

  it('is not editable while the set is under review', () => {
    expect(store.isEditable()).toBe(true);
    store.review('submit', '').subscribe();
    const request = http.expectOne('/api/reaction-sets/s1/submit');
    expect(request.request.body).toEqual({ version: 3 });
    request.flush({ set: { ...set([reaction('a', 0)]), reviewState: 'in_review' }, mail: { sent: ['reviewer@example.org'], failed: [] } });
    expect(store.isEditable()).toBe(false);
  });
});
