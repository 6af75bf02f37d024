import { LockMode, ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import { ConflictError } from '../errors/app-errors';
import { User } from '../users/user.entity';
import { ReactionSet } from './reaction-set.entity';

/**
 * Opens a set for a write to it, its reactions or its net reactions, inside
 * the caller's transaction: locks the row (concurrent writes to one set run one
 * after the other), refuses a set under review, turns a vetted set back into a
 * draft (its revisions stay), and records who changed it and when, which bumps
 * the set's version.
 *
 * @param tx EntityManager of the transaction
 * @param setId the set
 * @param actorId the writing user
 * @throws ConflictError REVIEW_LOCKED while the set is `in_review`
 */
export async function openSetForEdit(tx: EntityManager, setId: string, actorId: string): Promise<ReactionSet> {
  const set = await tx.findOneOrFail(ReactionSet, setId, { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true });
  if (set.reviewState === 'in_review') {
    throw new ConflictError('REVIEW_LOCKED', 'This set is under review: a reviewer must approve or return it before it can be edited.');
  }
  if (set.reviewState === 'vetted') set.reviewState = 'draft';
  set.updatedBy = ref(tx.getReference(User, actorId));
  set.updatedAt = new Date();
  return set;
}
