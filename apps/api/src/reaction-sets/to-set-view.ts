import { BALANCE_STATUSES, type ReactionSetHeader, type ReactionSetSummary, type StatusCounts } from '@tallus/contracts';
import { toActor } from '../users/to-actor';
import type { ReactionSet } from './reaction-set.entity';

/**
 * The set's own fields as every set answer carries them.
 *
 * @param set a set with `updatedBy` and `submittedBy` populated
 */
export function toSetHeader(set: ReactionSet): ReactionSetHeader {
  return {
    id: set.id,
    teamId: set.team.id,
    name: set.name,
    description: set.description,
    site: set.site,
    reviewState: set.reviewState,
    currentRevision: set.currentRevision,
    version: set.version,
    createdAt: set.createdAt.toISOString(),
    updatedAt: set.updatedAt.toISOString(),
    updatedBy: toActor(set.updatedBy),
    submittedBy: toActor(set.submittedBy),
    copiedFrom: set.copiedFrom ?? null,
  };
}

/** Counts of zero for every balance status. */
export function emptyStatusCounts(): StatusCounts {
  return Object.fromEntries(BALANCE_STATUSES.map((status) => [status, 0])) as StatusCounts;
}

/** A set with its reaction count and counts by balance status. */
export function toSetSummary(set: ReactionSet, counts: StatusCounts): ReactionSetSummary {
  const reactionCount = Object.values(counts).reduce((sum, count) => sum + count, 0);
  return { ...toSetHeader(set), reactionCount, statusCounts: counts };
}
