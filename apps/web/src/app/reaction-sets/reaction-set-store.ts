import { Injectable, computed, inject, signal } from '@angular/core';
import type { OxidationStateMap } from '@tallus/chem';
import { Observable, finalize, forkJoin, map, tap } from 'rxjs';
import type {
  CreateNetReactionRequest,
  CreateReactionRequest,
  NetReaction,
  Publication,
  Reaction,
  ReactionSetDetail,
  ReactionSetHeader,
  UpdateNetReactionRequest,
  UpdateReactionRequest,
} from '@tallus/contracts';

import { toOxidationStateMap } from '../species/oxidation-state-map';
import { SpeciesApi } from '../species/species-api';
import { ReactionSetsApi } from './reaction-sets-api';

/** The reaction set open in the editor, and every change to it. One store per open set page. */
@Injectable()
export class ReactionSetStore {
  private readonly api = inject(ReactionSetsApi);
  private readonly speciesApi = inject(SpeciesApi);

  private readonly setState = signal<ReactionSetDetail | null>(null);
  private readonly busyState = signal(0);
  private readonly oxidationStateMap = signal<OxidationStateMap | undefined>(undefined);

  /** The set as last read or written; null until loaded. */
  readonly set = this.setState.asReadonly();
  /** Whether a write is under way (for progress bars). */
  readonly isBusy = computed(() => this.busyState() > 0);
  /** Its reactions in set order. */
  readonly reactions = computed(() => [...(this.setState()?.reactions ?? [])].sort((a, b) => a.position - b.position));
  /** Whether the set takes edits now (not under review). */
  readonly isEditable = computed(() => {
    const state = this.setState()?.reviewState;
    return state !== undefined && state !== 'in_review';
  });

  /**
   * Explicit oxidation states of the built-in and the team's catalogue, which the server checks
   * the set's reactions with; undefined until loaded (the browser's checks use the engine's rules meanwhile).
   */
  readonly oxidationStates = this.oxidationStateMap.asReadonly();

  /** Loads the catalogues' explicit oxidation states, so that the browser's checks match the server's. */
  loadOxidationStates(teamId: string): Observable<OxidationStateMap> {
    return forkJoin([this.speciesApi.listBuiltin(), this.speciesApi.listTeamSpecies(teamId)]).pipe(
      map(([builtin, team]) => toOxidationStateMap(builtin, team)),
      tap((states) => this.oxidationStateMap.set(states)),
    );
  }

  /** Loads (or reloads, e.g. after a conflict) the set. */
  load(setId: string): Observable<ReactionSetDetail> {
    return this.api.getSet(setId).pipe(tap((set) => this.setState.set(set)));
  }

  /** Adds a reaction at the end. */
  addReaction(body: CreateReactionRequest): Observable<Reaction | undefined> {
    return this.write(this.api.createReaction(this.requireSet().id, body)).pipe(
      tap((answer) => this.applyReactionWrite(answer.set, answer.netReactions, answer.reaction)),
      map((answer) => answer.reaction),
    );
  }

  /** Saves a reaction's changes with the version it was read at (409 VERSION_CONFLICT when stale). */
  saveReaction(reactionId: string, body: UpdateReactionRequest): Observable<Reaction | undefined> {
    return this.write(this.api.updateReaction(reactionId, body)).pipe(
      tap((answer) => this.applyReactionWrite(answer.set, answer.netReactions, answer.reaction)),
      map((answer) => answer.reaction),
    );
  }

  /** Deletes a reaction. */
  deleteReaction(reaction: Reaction): Observable<void> {
    return this.write(this.api.deleteReaction(reaction.id, reaction.version)).pipe(
      tap((answer) => {
        this.applyReactionWrite(answer.set, answer.netReactions);
        this.patch({ reactions: this.requireSet().reactions.filter((entry) => entry.id !== reaction.id) });
      }),
      map(() => undefined),
    );
  }

  /**
   * Moves a reaction and saves the new order. The list moves at once; a refused order puts
   * the server's back.
   */
  move(fromIndex: number, toIndex: number): Observable<ReactionSetDetail> {
    const ordered = this.reactions();
    const [moved] = ordered.splice(fromIndex, 1);
    ordered.splice(toIndex, 0, moved);
    const previous = this.requireSet();
    this.patch({ reactions: ordered.map((reaction, position) => ({ ...reaction, position })) });
    return this.write(this.api.reorder(previous.id, ordered.map((reaction) => reaction.id))).pipe(
      tap({ next: (set) => this.setState.set(set), error: () => this.setState.set(previous) }),
    );
  }

  /** Saves a net reaction. */
  addNetReaction(body: CreateNetReactionRequest): Observable<NetReaction | undefined> {
    return this.write(this.api.createNetReaction(this.requireSet().id, body)).pipe(
      tap((answer) => {
        const netReactions = this.requireSet().netReactions;
        this.patchHeader(answer.set, { netReactions: answer.netReaction ? [...netReactions, answer.netReaction] : netReactions });
      }),
      map((answer) => answer.netReaction),
    );
  }

  /** Saves changes to a net reaction with the version it was read at (409 VERSION_CONFLICT when stale). */
  saveNetReaction(netReaction: NetReaction, body: Omit<UpdateNetReactionRequest, 'version'>): Observable<NetReaction | undefined> {
    return this.write(this.api.updateNetReaction(netReaction.id, { ...body, version: netReaction.version })).pipe(
      tap((answer) => {
        const saved = answer.netReaction;
        const netReactions = this.requireSet().netReactions.map((entry) => (saved && entry.id === saved.id ? saved : entry));
        this.patchHeader(answer.set, { netReactions });
      }),
      map((answer) => answer.netReaction),
    );
  }

  /** Deletes a net reaction. */
  deleteNetReaction(netReaction: NetReaction): Observable<void> {
    return this.write(this.api.deleteNetReaction(netReaction.id, netReaction.version)).pipe(
      tap((answer) =>
        this.patchHeader(answer.set, { netReactions: this.requireSet().netReactions.filter((entry) => entry.id !== netReaction.id) }),
      ),
      map(() => undefined),
    );
  }

  /** A review step; the answer is the whole set after it. Returns who was e-mailed. */
  review(step: 'submit' | 'approve' | 'return', comment: string): Observable<string[]> {
    const set = this.requireSet();
    const body = comment.trim() ? { comment: comment.trim(), version: set.version } : { version: set.version };
    return this.write(this.api.review(set.id, step, body)).pipe(
      tap((answer) => this.setState.set(answer.set)),
      map((answer) => answer.mail.sent),
    );
  }

  /** Publishes the latest vetted revision to the library. */
  publish(): Observable<Publication> {
    const set = this.requireSet();
    return this.write(this.api.publish(set.id)).pipe(
      tap((publication) =>
        this.patch({
          revisions: set.revisions.map((revision) =>
            revision.number === publication.revision ? { ...revision, publicationId: publication.id } : revision,
          ),
        }),
      ),
    );
  }

  private applyReactionWrite(header: ReactionSetHeader, netReactions: NetReaction[], reaction?: Reaction): void {
    const reactions = this.requireSet().reactions;
    const next = reaction
      ? reactions.some((entry) => entry.id === reaction.id)
        ? reactions.map((entry) => (entry.id === reaction.id ? reaction : entry))
        : [...reactions, reaction]
      : reactions;
    this.patchHeader(header, { reactions: next, netReactions });
  }

  private patchHeader(header: ReactionSetHeader, changes: Partial<ReactionSetDetail>): void {
    const set = this.requireSet();
    const reactions = changes.reactions ?? set.reactions;
    this.setState.set({ ...set, ...header, ...changes, reactionCount: reactions.length, statusCounts: countStatuses(reactions) });
  }

  private patch(changes: Partial<ReactionSetDetail>): void {
    this.setState.set({ ...this.requireSet(), ...changes });
  }

  private write<T>(request: Observable<T>): Observable<T> {
    this.busyState.update((count) => count + 1);
    return request.pipe(finalize(() => this.busyState.update((count) => count - 1)));
  }

  private requireSet(): ReactionSetDetail {
    const set = this.setState();
    if (!set) throw new Error('No reaction set loaded');
    return set;
  }
}

function countStatuses(reactions: readonly Reaction[]): ReactionSetDetail['statusCounts'] {
  const counts = { balanced: 0, unbalanced: 0, open: 0, impossible: 0, invalid: 0 };
  for (const reaction of reactions) counts[reaction.result.status]++;
  return counts;
}
