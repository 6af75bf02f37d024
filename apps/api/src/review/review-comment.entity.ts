import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { REVIEW_ACTIONS } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { User } from '../users/user.entity';

/** One step of a set's review: a submission (with an optional note), a return with its comment, an approval. */
export const ReviewComment = defineEntity({
  name: 'ReviewComment',
  tableName: 'review_comments',
  properties: {
    ...baseProperties,
    set: () => p.manyToOne(ReactionSet).ref().deleteRule('cascade').index(),
    action: p.enum([...REVIEW_ACTIONS]),
    author: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
    comment: p.text().default(''),
    /** The revision an approval created. */
    revision: p.integer().nullable(),
  },
});

/** One step of a set's review. */
export type ReviewComment = InferEntity<typeof ReviewComment>;
