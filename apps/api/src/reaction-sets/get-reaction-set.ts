import type { EntityManager } from '@mikro-orm/postgresql';
import type { ReactionSetDetail, StatusCounts } from '@tallus/contracts';
import { NetReaction } from '../net-reactions/net-reaction.entity';
import { toNetReactionView } from '../net-reactions/to-net-reaction-view';
import { readReactionViews } from '../reactions/read-reaction-views';
import { listRevisions } from '../review/get-revisions';
import { ReviewComment } from '../review/review-comment.entity';
import { toActor } from '../users/to-actor';
import { ReactionSet } from './reaction-set.entity';
import { emptyStatusCounts, toSetSummary } from './to-set-view';

/**
 * A set with its reactions and their stored results, its net reactions, review
 * history and revisions: a fixed handful of queries whatever the size of the set
 * (nothing is recomputed, no query per reaction).
 *
 * @param em an EntityManager (the request's, or a transaction's after a write)
 * @param setId the set
 * @throws NotFoundError (MikroORM's) when the set is gone
 */
export async function getReactionSet(em: EntityManager, setId: string): Promise<ReactionSetDetail> {
  const set = await em.findOneOrFail(ReactionSet, setId, { populate: ['updatedBy', 'submittedBy'], refresh: true });
  const [reactions, nets, comments, revisions] = await readTogether(em, [
    () => readReactionViews(em, setId),
    () => em.find(NetReaction, { set: setId }, { orderBy: { position: 'asc', createdAt: 'asc' }, refresh: true }),
    () => em.find(ReviewComment, { set: setId }, { orderBy: { createdAt: 'asc', id: 'asc' }, populate: ['author'] }),
    () => listRevisions(em, setId),
  ]);
  const counts: StatusCounts = emptyStatusCounts();
  for (const reaction of reactions) counts[reaction.result.status]++;
  return {
    ...toSetSummary(set, counts),
    reactions,
    netReactions: nets.map(toNetReactionView),
    comments: comments.map((comment) => ({
      id: comment.id,
      action: comment.action,
      author: toActor(comment.author),
      comment: comment.comment,
      revision: comment.revision ?? null,
      createdAt: comment.createdAt.toISOString(),
    })),
    revisions,
  };
}

/**
 * Runs independent reads side by side on pooled connections, or one after another inside a
 * transaction, where every query shares the transaction's single connection (node-postgres
 * refuses overlapping queries on one client).
 */
async function readTogether<A, B, C, D>(
  em: EntityManager,
  reads: [() => Promise<A>, () => Promise<B>, () => Promise<C>, () => Promise<D>],
): Promise<[A, B, C, D]> {
  const [a, b, c, d] = reads;
  if (!em.isInTransaction()) return Promise.all([a(), b(), c(), d()]);
  return [await a(), await b(), await c(), await d()];
}
