import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateNetReactionRequest, NetReactionWriteResponse, UpdateNetReactionRequest } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { assertVersion } from '../db/assert-version';
import { BadRequestError } from '../errors/app-errors';
import { openSetForEdit } from '../reaction-sets/open-set-for-edit';
import type { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { toSetHeader } from '../reaction-sets/to-set-view';
import { loadOxidationStates } from '../species/load-oxidation-states';
import { computeNetResult } from './compute-net-result';
import { NetReaction, type StoredNetMember } from './net-reaction.entity';
import { loadMemberEquations } from './recompute-net-reactions';
import { toNetReactionView } from './to-net-reaction-view';

/** Who adds which net reaction to which set. */
export interface CreateNetReactionInput {
  setId: string;
  actorId: string;
  request: CreateNetReactionRequest;
}

/**
 * Adds a net reaction and computes it. One transaction.
 *
 * @throws BadRequestError NET_REACTION_UNKNOWN_REACTION (400, each bad member's path) for a reaction not in the set
 * @throws ConflictError REVIEW_LOCKED while the set is under review
 */
export async function createNetReaction(em: EntityManager, input: CreateNetReactionInput): Promise<NetReactionWriteResponse> {
  return em.transactional(async (tx) => {
    const set = await openSetForEdit(tx, input.setId, input.actorId);
    const position = await tx.count(NetReaction, { set: set.id });
    const net = tx.create(NetReaction, { id: randomUUID(), set: ref(set), position, name: input.request.name, members: [], cancel: [], status: 'invalid', result: emptyResult() });
    await applyMembers(tx, set, net, { members: toStored(input.request.reactions), cancel: input.request.cancel });
    recordAudit(tx, { teamId: set.team.id, actorId: input.actorId, action: 'net_reaction.created', entityType: 'net_reaction', entityId: net.id, summary: `Added net reaction "${net.name}" to "${set.name}"` });
    return finish(tx, set, net);
  });
}

/** Who changes which net reaction. */
export interface UpdateNetReactionInput {
  netReactionId: string;
  actorId: string;
  request: UpdateNetReactionRequest;
}

/**
 * Changes a net reaction and recomputes it. One transaction.
 *
 * @throws ConflictError VERSION_CONFLICT when `version` is stale, and as {@link createNetReaction}
 */
export async function updateNetReaction(em: EntityManager, input: UpdateNetReactionInput): Promise<NetReactionWriteResponse> {
  return em.transactional(async (tx) => {
    const set = await openSetForEdit(tx, await setIdOf(tx, input.netReactionId), input.actorId);
    const net = await tx.findOneOrFail(NetReaction, input.netReactionId, { refresh: true });
    assertVersion(net.version, input.request.version);
    if (input.request.name !== undefined) net.name = input.request.name;
    const members = input.request.reactions ? toStored(input.request.reactions) : net.members;
    await applyMembers(tx, set, net, { members, cancel: input.request.cancel ?? net.cancel });
    recordAudit(tx, { teamId: set.team.id, actorId: input.actorId, action: 'net_reaction.updated', entityType: 'net_reaction', entityId: net.id, summary: `Changed net reaction "${net.name}" in "${set.name}"` });
    return finish(tx, set, net);
  });
}

/** Deletes a net reaction. One transaction. @throws ConflictError REVIEW_LOCKED while the set is under review */
export async function deleteNetReaction(em: EntityManager, netReactionId: string, actorId: string): Promise<NetReactionWriteResponse> {
  return em.transactional(async (tx) => {
    const set = await openSetForEdit(tx, await setIdOf(tx, netReactionId), actorId);
    const net = await tx.findOneOrFail(NetReaction, netReactionId, { refresh: true });
    recordAudit(tx, { teamId: set.team.id, actorId, action: 'net_reaction.deleted', entityType: 'net_reaction', entityId: net.id, summary: `Deleted net reaction "${net.name}" from "${set.name}"` });
    tx.remove(net);
    return finish(tx, set);
  });
}

function toStored(members: CreateNetReactionRequest['reactions']): StoredNetMember[] {
  return members.map((member) => ({ reactionId: member.reactionId, multiplier: member.multiplier ?? null }));
}

async function applyMembers(tx: EntityManager, set: ReactionSet, net: NetReaction, wanted: { members: StoredNetMember[]; cancel: string[] }): Promise<void> {
  const equations = await loadMemberEquations(tx, set.id, wanted.members.map((member) => member.reactionId));
  const issues = wanted.members.flatMap((member, index) =>
    equations.has(member.reactionId)
      ? []
      : [{ code: 'NET_REACTION_UNKNOWN_REACTION', message: 'No reaction with this id in the set.', path: ['reactions', index, 'reactionId'] }],
  );
  if (issues.length > 0) throw new BadRequestError('NET_REACTION_UNKNOWN_REACTION', 'A net reaction can only combine reactions of its own set.', issues);
  const result = computeNetResult({ members: wanted.members, equations, cancel: wanted.cancel, oxidationStates: await loadOxidationStates(tx, set.team.id) });
  Object.assign(net, { members: wanted.members, cancel: wanted.cancel, result, status: result.status });
}

async function finish(tx: EntityManager, set: ReactionSet, net?: NetReaction): Promise<NetReactionWriteResponse> {
  await tx.flush();
  await tx.populate(set, ['updatedBy', 'submittedBy']);
  return { ...(net ? { netReaction: toNetReactionView(net) } : {}), set: toSetHeader(set) };
}

function emptyResult(): NetReaction['result'] {
  return { status: 'invalid', multipliers: [], equation: null, terms: [], freedom: 0, warnings: [], protonBudget: null, electrons: null };
}

async function setIdOf(tx: EntityManager, netReactionId: string): Promise<string> {
  const rows = await tx.execute<Array<{ set_id: string }>>('select set_id from net_reactions where id = ?', [netReactionId]);
  const setId = rows[0]?.set_id;
  if (!setId) throw new Error(`Net reaction ${netReactionId} vanished after its access check`);
  return setId;
}
