import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { Revision as RevisionView } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { User } from '../users/user.entity';

/** What a revision freezes: the set's fields, its reactions and net reactions with their results, and the species they used. */
export type RevisionSnapshot = Pick<RevisionView, 'set' | 'reactions' | 'netReactions' | 'species'>;

/**
 * An immutable snapshot of a vetted set, numbered 1, 2, … per set. Written once
 * on approval and never updated; it stays readable whatever happens to the set.
 */
export const Revision = defineEntity({
  name: 'Revision',
  tableName: 'revisions',
  properties: {
    ...baseProperties,
    set: () => p.manyToOne(ReactionSet).ref().deleteRule('cascade'),
    number: p.integer(),
    snapshot: p.json<RevisionSnapshot>().lazy(true, false),
    reactionCount: p.integer(),
    vettedBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
    vettedAt: p.datetime(),
  },
  uniques: [{ properties: ['set', 'number'] }],
});

/** An immutable snapshot of a vetted set. */
export type Revision = InferEntity<typeof Revision>;
