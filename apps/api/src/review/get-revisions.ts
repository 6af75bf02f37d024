import type { EntityManager } from '@mikro-orm/postgresql';
import type { Revision as RevisionView, RevisionListResponse } from '@tallus/contracts';
import { NotFoundError } from '../errors/app-errors';
import { Publication } from '../library/publication.entity';
import { toActor } from '../users/to-actor';
import { Revision, type RevisionSnapshot } from './revision.entity';

/** A set's vetted revisions, newest first (without their snapshots). */
export async function listRevisions(em: EntityManager, setId: string): Promise<RevisionListResponse> {
  const revisions = await em.find(Revision, { set: setId }, { orderBy: { number: 'desc' }, populate: ['vettedBy'] });
  const publications = revisions.length === 0 ? [] : await em.find(Publication, { revision: { $in: revisions.map((revision) => revision.id) } });
  const publicationOf = new Map(publications.map((publication) => [publication.revision.id, publication.id]));
  return revisions.map((revision) => ({
    number: revision.number,
    vettedBy: toActor(revision.vettedBy),
    vettedAt: revision.vettedAt.toISOString(),
    reactionCount: revision.reactionCount,
    publicationId: publicationOf.get(revision.id) ?? null,
  }));
}

/** A revision with its snapshot, as responses show it. */
export function toRevisionView(revision: Revision): RevisionView {
  return {
    setId: revision.set.id,
    number: revision.number,
    vettedBy: toActor(revision.vettedBy),
    vettedAt: revision.vettedAt.toISOString(),
    ...(revision.snapshot as RevisionSnapshot),
  };
}

/**
 * One vetted revision of a set, exactly as it was frozen.
 *
 * @throws NotFoundError REVISION_NOT_FOUND
 */
export async function getRevision(em: EntityManager, setId: string, number: number): Promise<RevisionView> {
  const revision = await em.findOne(Revision, { set: setId, number }, { populate: ['vettedBy', 'snapshot'] });
  if (!revision) throw new NotFoundError('REVISION_NOT_FOUND', `This set has no revision ${number}.`);
  return toRevisionView(revision);
}
