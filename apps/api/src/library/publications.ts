import { randomUUID } from 'node:crypto';
import { LockMode, ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { LibraryResponse, Publication as PublicationView, PublicationDetail } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { ConflictError, NotFoundError } from '../errors/app-errors';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { toRevisionView } from '../review/get-revisions';
import { Revision, type RevisionSnapshot } from '../review/revision.entity';
import { toActor } from '../users/to-actor';
import { User } from '../users/user.entity';
import { Publication } from './publication.entity';

const POPULATE = ['team', 'publishedBy', 'revision'] as const;

/**
 * A publication as responses show it, under `setName`: the name frozen with the revision,
 * so later renames of the live set do not change what was published.
 */
function toPublicationView(publication: Publication, setName: string): PublicationView {
  const revision = publication.revision.getEntity();
  return {
    id: publication.id,
    teamId: publication.team.id,
    teamName: publication.team.getEntity().name,
    setId: revision.set.id,
    setName,
    revision: revision.number,
    reactionCount: revision.reactionCount,
    publishedBy: toActor(publication.publishedBy),
    publishedAt: publication.createdAt.toISOString(),
  };
}

/**
 * Publications with the set names frozen in their revisions' snapshots, read in one query
 * from the JSON column without loading the (lazy, large) snapshots themselves.
 */
async function toPublicationViews(em: EntityManager, publications: Publication[]): Promise<PublicationView[]> {
  if (publications.length === 0) return [];
  const revisionIds = publications.map((publication) => publication.revision.id);
  const rows = await em.execute<Array<{ id: string; set_name: string }>>(
    `select id, snapshot->'set'->>'name' as set_name from revisions where id in (${revisionIds.map(() => '?').join(', ')})`,
    revisionIds,
  );
  const nameOf = new Map(rows.map((row) => [row.id, row.set_name]));
  return publications.map((publication) => toPublicationView(publication, nameOf.get(publication.revision.id)!));
}

/**
 * Publishes the latest vetted revision of a set to the library (owners).
 *
 * @throws ConflictError PUBLISH_NOT_VETTED unless the set is vetted; PUBLISH_ALREADY_PUBLISHED for a revision in the library
 */
export async function publishSet(em: EntityManager, setId: string, actorId: string): Promise<PublicationView> {
  const id = await em.transactional(async (tx) => {
    const set = await tx.findOneOrFail(ReactionSet, setId, { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true });
    if (set.reviewState !== 'vetted') throw new ConflictError('PUBLISH_NOT_VETTED', `Only a vetted set can be published; this one is ${set.reviewState}.`);
    const revision = await tx.findOneOrFail(Revision, { set: set.id, number: set.currentRevision });
    if ((await tx.count(Publication, { revision })) > 0) {
      throw new ConflictError('PUBLISH_ALREADY_PUBLISHED', `Revision ${revision.number} of this set is already in the library.`);
    }
    const publication = tx.create(Publication, { id: randomUUID(), team: set.team, revision: ref(revision), publishedBy: ref(tx.getReference(User, actorId)) });
    recordAudit(tx, { teamId: set.team.id, actorId, action: 'publication.created', entityType: 'publication', entityId: publication.id, summary: `Published revision ${revision.number} of "${set.name}" to the library` });
    await tx.flush();
    return publication.id;
  });
  const [view] = await toPublicationViews(em, [await em.findOneOrFail(Publication, id, { populate: [...POPULATE], refresh: true })]);
  return view!;
}

/** Every publication of every team, newest first (any signed-in user). */
export async function listLibrary(em: EntityManager): Promise<LibraryResponse> {
  const publications = await em.find(Publication, {}, { orderBy: { createdAt: 'desc', id: 'asc' }, populate: [...POPULATE] });
  return toPublicationViews(em, publications);
}

/**
 * One publication with its frozen revision.
 *
 * @throws NotFoundError PUBLICATION_NOT_FOUND
 */
export async function getPublication(em: EntityManager, publicationId: string): Promise<PublicationDetail> {
  const publication = await em.findOne(Publication, publicationId, { populate: [...POPULATE, 'revision.snapshot', 'revision.vettedBy'] });
  if (!publication) throw new NotFoundError('PUBLICATION_NOT_FOUND', 'No such publication in the library.');
  const revision = publication.revision.getEntity();
  return { ...toPublicationView(publication, (revision.snapshot as RevisionSnapshot).set.name), snapshot: toRevisionView(revision) };
}
