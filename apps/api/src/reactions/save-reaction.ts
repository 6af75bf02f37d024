import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { OxidationStateMap } from '@tallus/chem';
import type { CreateReactionRequest, ReactionWriteResponse, UpdateReactionRequest } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { assertVersion } from '../db/assert-version';
import { recomputeNetReactions } from '../net-reactions/recompute-net-reactions';
import { toNetReactionView } from '../net-reactions/to-net-reaction-view';
import { openSetForEdit } from '../reaction-sets/open-set-for-edit';
import type { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { toSetHeader } from '../reaction-sets/to-set-view';
import { loadOxidationStates } from '../species/load-oxidation-states';
import { computeReactionResult } from './compute-reaction-result';
import { Reaction } from './reaction.entity';
import { toReactionView, toResultColumns } from './to-reaction-view';

/** Who adds which reaction to which set. */
export interface CreateReactionInput {
  setId: string;
  actorId: string;
  request: CreateReactionRequest;
}

/**
 * Adds a reaction to a set, computing and storing its check and budgets; an
 * equation that does not parse is saved with status `invalid`. The set's net
 * reactions are recomputed; a vetted set becomes a draft. One transaction.
 *
 * @throws ConflictError REVIEW_LOCKED while the set is under review
 */
export async function createReaction(em: EntityManager, input: CreateReactionInput): Promise<ReactionWriteResponse> {
  return em.transactional(async (tx) => {
    const set = await openSetForEdit(tx, input.setId, input.actorId);
    const count = await tx.count(Reaction, { set: set.id });
    const position = Math.min(input.request.position ?? count, count);
    if (position < count) {
      await tx.execute('update reactions set position = position + 1 where set_id = ? and position >= ?', [set.id, position]);
    }
    const { request } = input;
    const reference = request.reference || null;
    const oxidationStates = await loadOxidationStates(tx, set.team.id);
    const result = computeReactionResult({ equation: request.equation, reference, oxidationStates });
    const reaction = tx.create(Reaction, {
      id: randomUUID(),
      set: ref(set),
      position,
      name: request.name,
      kind: request.kind,
      equation: request.equation,
      reference,
      citation: request.citation ?? '',
      notes: request.notes ?? '',
      ...toResultColumns(result),
    });
    recordAudit(tx, { teamId: set.team.id, actorId: input.actorId, action: 'reaction.created', entityType: 'reaction', entityId: reaction.id, summary: `Added reaction "${reaction.name}" to "${set.name}"` });
    return finishReactionWrite(tx, set, oxidationStates, reaction);
  });
}

/** Who changes which reaction. */
export interface UpdateReactionInput {
  reactionId: string;
  actorId: string;
  request: UpdateReactionRequest;
}

/**
 * Changes a reaction and recomputes its stored results and the set's net reactions. One transaction.
 *
 * @throws ConflictError VERSION_CONFLICT when `version` is stale; REVIEW_LOCKED while the set is under review
 */
export async function updateReaction(em: EntityManager, input: UpdateReactionInput): Promise<ReactionWriteResponse> {
  return em.transactional(async (tx) => {
    const setId = await setIdOf(tx, input.reactionId);
    const set = await openSetForEdit(tx, setId, input.actorId);
    const reaction = await tx.findOneOrFail(Reaction, input.reactionId, { refresh: true });
    assertVersion(reaction.version, input.request.version);
    const { version: _version, reference, ...fields } = input.request;
    Object.assign(reaction, Object.fromEntries(Object.entries(fields).filter(([, value]) => value !== undefined)));
    if (reference !== undefined) reaction.reference = reference || null;
    const oxidationStates = await loadOxidationStates(tx, set.team.id);
    const result = computeReactionResult({ equation: reaction.equation, reference: reaction.reference ?? null, oxidationStates });
    Object.assign(reaction, toResultColumns(result));
    recordAudit(tx, { teamId: set.team.id, actorId: input.actorId, action: 'reaction.updated', entityType: 'reaction', entityId: reaction.id, summary: `Changed reaction "${reaction.name}" in "${set.name}"` });
    return finishReactionWrite(tx, set, oxidationStates, reaction);
  });
}

/**
 * Deletes a reaction, closes the gap in the positions, drops it from net
 * reactions and recomputes them. One transaction.
 *
 * @throws ConflictError REVIEW_LOCKED while the set is under review
 */
export async function deleteReaction(em: EntityManager, reactionId: string, actorId: string): Promise<ReactionWriteResponse> {
  return em.transactional(async (tx) => {
    const set = await openSetForEdit(tx, await setIdOf(tx, reactionId), actorId);
    const reaction = await tx.findOneOrFail(Reaction, reactionId, { refresh: true });
    recordAudit(tx, { teamId: set.team.id, actorId, action: 'reaction.deleted', entityType: 'reaction', entityId: reaction.id, summary: `Deleted reaction "${reaction.name}" from "${set.name}"` });
    tx.remove(reaction);
    await tx.flush();
    await tx.execute('update reactions set position = position - 1 where set_id = ? and position > ?', [set.id, reaction.position]);
    return finishReactionWrite(tx, set, await loadOxidationStates(tx, set.team.id));
  });
}

/**
 * Flushes the reaction, recomputes the set's net reactions, flushes again, and builds the answer.
 *
 * @param oxidationStates the team's states, as the write loaded them in this transaction
 */
async function finishReactionWrite(tx: EntityManager, set: ReactionSet, oxidationStates: OxidationStateMap, reaction?: Reaction): Promise<ReactionWriteResponse> {
  await tx.flush();
  const nets = await recomputeNetReactions(tx, set.id, oxidationStates);
  await tx.flush();
  await tx.populate(set, ['updatedBy', 'submittedBy']);
  return { ...(reaction ? { reaction: toReactionView(reaction) } : {}), set: toSetHeader(set), netReactions: nets.map(toNetReactionView) };
}

/** The set of a reaction, read without loading the reaction into the identity map before the set is locked. */
async function setIdOf(tx: EntityManager, reactionId: string): Promise<string> {
  const rows = await tx.execute<Array<{ set_id: string }>>('select set_id from reactions where id = ?', [reactionId]);
  const setId = rows[0]?.set_id;
  if (!setId) throw new Error(`Reaction ${reactionId} vanished after its access check`);
  return setId;
}
