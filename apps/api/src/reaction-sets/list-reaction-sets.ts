import type { EntityManager } from '@mikro-orm/postgresql';
import type { ReactionSetListResponse, ReviewState } from '@tallus/contracts';
import { countStatuses } from './count-statuses';
import { ReactionSet } from './reaction-set.entity';
import { toSetSummary } from './to-set-view';

/**
 * A team's reaction sets, most recently updated first, with reaction counts by
 * stored balance status: two queries whatever the number of reactions.
 *
 * @param state only sets in this review state, when given
 */
export async function listReactionSets(em: EntityManager, teamId: string, state?: ReviewState): Promise<ReactionSetListResponse> {
  const sets = await em.find(
    ReactionSet,
    { team: teamId, ...(state ? { reviewState: state } : {}) },
    { orderBy: { updatedAt: 'desc', id: 'asc' }, populate: ['updatedBy', 'submittedBy'] },
  );
  const counts = await countStatuses(em, sets.map((set) => set.id));
  return sets.map((set) => toSetSummary(set, counts.get(set.id)!));
}
