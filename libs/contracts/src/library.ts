import { z } from 'zod';
import { actorSchema } from './activity';
import { revisionSchema } from './review';

/** Id of a publication in a route; anything else answers 404. */
export const publicationIdSchema = z.uuid();

/**
 * A library publication: the latest vetted revision of a set, published by an
 * owner of its team for every signed-in user to read and copy. A row of
 * `GET /api/library` and the answer of `POST /api/reaction-sets/:id/publish` (201).
 */
export const publicationSchema = z.object({
  id: z.uuid(),
  teamId: z.uuid(),
  teamName: z.string(),
  setId: z.uuid(),
  setName: z.string(),
  revision: z.number().int().positive(),
  reactionCount: z.number().int().nonnegative(),
  publishedBy: actorSchema.nullable(),
  publishedAt: z.iso.datetime(),
});
export type Publication = z.infer<typeof publicationSchema>;

/** Answer of `GET /api/library`: newest first. */
export const libraryResponseSchema = z.array(publicationSchema);
export type LibraryResponse = z.infer<typeof libraryResponseSchema>;

/** Answer of `GET /api/library/:publicationId`: the publication with its frozen revision. */
export const publicationDetailSchema = publicationSchema.extend({
  snapshot: revisionSchema,
});
export type PublicationDetail = z.infer<typeof publicationDetailSchema>;

/** Body of `POST /api/library/:publicationId/copy` (editor+ in the target team): answers 201 with the new draft set. */
export const copyPublicationRequestSchema = z.object({
  teamId: z.uuid(),
});
export type CopyPublicationRequest = z.infer<typeof copyPublicationRequestSchema>;
