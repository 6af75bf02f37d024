import type { EntityManager } from '@mikro-orm/postgresql';
import type { ReactionSetDetail } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { ConflictError } from '../errors/app-errors';
import { getReactionSet } from '../reaction-sets/get-reaction-set';
import { openSetForEdit } from '../reaction-sets/open-set-for-edit';

/** Who puts which set's reactions in which order. */
export interface ReorderReactionsInput {
  setId: string;
  actorId: string;
  /** Every reaction id of the set exactly once, in the new order. */
  reactionIds: readonly string[];
}

/**
 * Puts a set's reactions in a new order, in one statement inside one transaction.
 *
 * @throws ConflictError REORDER_MISMATCH when the ids are not exactly the set's reactions (someone added or removed one: reload);
 *   REVIEW_LOCKED while under review
 */
export async function reorderReactions(em: EntityManager, input: ReorderReactionsInput): Promise<ReactionSetDetail> {
  return em.transactional(async (tx) => {
    const set = await openSetForEdit(tx, input.setId, input.actorId);
    const rows = await tx.execute<Array<{ id: string }>>('select id from reactions where set_id = ?', [set.id]);
    const current = new Set(rows.map((row) => row.id));
    const isSameSet = input.reactionIds.length === current.size && new Set(input.reactionIds).size === current.size && input.reactionIds.every((id) => current.has(id));
    if (!isSameSet) {
      throw new ConflictError('REORDER_MISMATCH', `The order must list each of the set's ${current.size} reactions exactly once; reload the set and retry.`);
    }
    if (input.reactionIds.length > 0) {
      const values = input.reactionIds.map(() => '(?::uuid, ?::int)').join(', ');
      await tx.execute(
        `update reactions as r set position = v.position, updated_at = now() from (values ${values}) as v(id, position) where r.id = v.id and r.set_id = ?`,
        [...input.reactionIds.flatMap((id, index) => [id, index]), set.id],
      );
    }
    recordAudit(tx, { teamId: set.team.id, actorId: input.actorId, action: 'reaction_set.reordered', entityType: 'reaction_set', entityId: set.id, summary: `Reordered the reactions of "${set.name}"` });
    await tx.flush();
    return getReactionSet(tx, set.id);
  });
}
