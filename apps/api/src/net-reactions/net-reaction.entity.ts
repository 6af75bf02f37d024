import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { COMBINE_STATUSES, type NetReactionResult } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { trackedProperties } from '../db/tracked-properties';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';

/** One member of a net reaction as stored: a reaction of the set and its fixed multiplier, if any. */
export interface StoredNetMember {
  reactionId: string;
  multiplier: string | null;
}

/**
 * A net reaction of a set: its reactions times exact multipliers chosen so
 * that the named intermediates cancel, with the result libs/chem computed on
 * the last save of it or of one of its reactions.
 */
export const NetReaction = defineEntity({
  name: 'NetReaction',
  tableName: 'net_reactions',
  properties: {
    ...baseProperties,
    ...trackedProperties,
    set: () => p.manyToOne(ReactionSet).ref().deleteRule('cascade').index(),
    position: p.integer(),
    name: p.string().length(200),
    members: p.json<StoredNetMember[]>(),
    /** Formulas of the species that must cancel. */
    cancel: p.json<string[]>(),
    status: p.enum([...COMBINE_STATUSES]),
    result: p.json<NetReactionResult>(),
  },
});

/** A net reaction of a set. */
export type NetReaction = InferEntity<typeof NetReaction>;
