import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { REVIEW_STATES, type CopiedFrom } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { trackedProperties } from '../db/tracked-properties';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';

/**
 * A named, ordered collection of reactions of one team, with its review state.
 * `version` changes with every write to the set or its reactions and net reactions.
 */
export const ReactionSet = defineEntity({
  name: 'ReactionSet',
  tableName: 'reaction_sets',
  properties: {
    ...baseProperties,
    ...trackedProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade').index(),
    name: p.string().length(200),
    description: p.text().default(''),
    site: p.string().length(200).default(''),
    reviewState: p.enum([...REVIEW_STATES]).default('draft'),
    /** Number of the latest vetted revision; 0 before the first approval. */
    currentRevision: p.integer().default(0),
    createdBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
    updatedBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
    submittedBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
    copiedFrom: p.json<CopiedFrom>().nullable(),
  },
});

/** A named, ordered collection of reactions of one team. */
export type ReactionSet = InferEntity<typeof ReactionSet>;
