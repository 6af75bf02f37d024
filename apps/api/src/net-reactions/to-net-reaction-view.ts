import type { NetReaction as NetReactionView } from '@tallus/contracts';
import type { NetReaction } from './net-reaction.entity';

/** A net reaction with its stored result, as responses show it. */
export function toNetReactionView(net: NetReaction): NetReactionView {
  return {
    id: net.id,
    setId: net.set.id,
    name: net.name,
    reactions: net.members.map((member) => ({ reactionId: member.reactionId, multiplier: member.multiplier })),
    cancel: net.cancel,
    result: net.result,
    version: net.version,
    updatedAt: net.updatedAt.toISOString(),
  };
}
