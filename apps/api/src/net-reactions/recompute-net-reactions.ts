import type { EntityManager } from '@mikro-orm/postgresql';
import type { OxidationStateMap } from '@tallus/chem';
import { Reaction } from '../reactions/reaction.entity';
import { computeNetResult, type MemberEquation } from './compute-net-result';
import { NetReaction } from './net-reaction.entity';

/**
 * The equations of the given reactions of a set, as net reactions use them:
 * the balanced text when there is one, else the text as written.
 */
export async function loadMemberEquations(tx: EntityManager, setId: string, reactionIds: readonly string[]): Promise<Map<string, MemberEquation>> {
  if (reactionIds.length === 0) return new Map();
  const reactions = await tx.find(Reaction, { set: setId, id: { $in: [...new Set(reactionIds)] } });
  return new Map(reactions.map((reaction) => [reaction.id, { equation: reaction.balance.balancedEquation ?? reaction.equation }]));
}

/**
 * Recomputes every net reaction of a set after its reactions changed, inside
 * the caller's transaction: members whose reaction was deleted are dropped.
 * Call after the reaction changes are flushed.
 *
 * @returns the set's net reactions, in order
 */
export async function recomputeNetReactions(tx: EntityManager, setId: string, oxidationStates: OxidationStateMap): Promise<NetReaction[]> {
  const nets = await tx.find(NetReaction, { set: setId }, { orderBy: { position: 'asc', createdAt: 'asc' }, refresh: true });
  const equations = await loadMemberEquations(tx, setId, nets.flatMap((net) => net.members.map((member) => member.reactionId)));
  for (const net of nets) {
    const members = net.members.filter((member) => equations.has(member.reactionId));
    const result = computeNetResult({ members, equations, cancel: net.cancel, oxidationStates });
    if (members.length !== net.members.length) net.members = members;
    if (JSON.stringify(result) !== JSON.stringify(net.result)) {
      net.result = result;
      net.status = result.status;
    }
  }
  return nets;
}
