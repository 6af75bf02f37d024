import { z } from 'zod';
import { actorSchema } from './activity';
import { BALANCE_STATUSES } from './chem-results';
import { netReactionSchema, reactionSchema } from './reactions';

/**
 * Review states (DESIGN.md §2): `draft` → `in_review` → `vetted`; a reviewer
 * may send a set under review back as `returned` (a draft with comments). Drafts
 * and returned sets take edits; a set under review refuses them (409
 * REVIEW_LOCKED); any edit to a vetted set makes it a `draft` again, and its
 * vetted revisions stay readable.
 */
export const REVIEW_STATES = ['draft', 'in_review', 'returned', 'vetted'] as const;
export const reviewStateSchema = z.enum(REVIEW_STATES);
export type ReviewState = z.infer<typeof reviewStateSchema>;

/** Id of a reaction set in a route; anything else answers 404. */
export const reactionSetIdSchema = z.uuid();

/** Where a copied set came from (`POST /api/library/:publicationId/copy`). */
export const copiedFromSchema = z.object({
  publicationId: z.uuid(),
  teamName: z.string(),
  setName: z.string(),
  revision: z.number().int().positive(),
});
export type CopiedFrom = z.infer<typeof copiedFromSchema>;

/** The set's own fields and state, as every set answer carries them. */
export const reactionSetHeaderSchema = z.object({
  id: z.uuid(),
  teamId: z.uuid(),
  name: z.string(),
  description: z.string(),
  /** Site or purpose, e.g. "Tarnwick Hill waste-rock dump (invented)". */
  site: z.string(),
  reviewState: reviewStateSchema,
  /** Number of the latest vetted revision; 0 before the first approval. */
  currentRevision: z.number().int().nonnegative(),
  /** Optimistic-lock version: changes with every write to the set, its reactions or net reactions. */
  version: z.number().int().positive(),
  createdAt: z.iso.datetime(),
  updatedAt: z.iso.datetime(),
  updatedBy: actorSchema.nullable(),
  /** Who submitted the current review (while `in_review`, and after a decision). */
  submittedBy: actorSchema.nullable(),
  copiedFrom: copiedFromSchema.nullable(),
});
export type ReactionSetHeader = z.infer<typeof reactionSetHeaderSchema>;

/** Reactions of a set counted by stored balance status. */
export const statusCountsSchema = z.object(Object.fromEntries(BALANCE_STATUSES.map((status) => [status, z.number().int().nonnegative()])) as {
  [K in (typeof BALANCE_STATUSES)[number]]: z.ZodNumber;
});
export type StatusCounts = z.infer<typeof statusCountsSchema>;

/** One row of `GET /api/teams/:teamId/reaction-sets`. */
export const reactionSetSummarySchema = reactionSetHeaderSchema.extend({
  reactionCount: z.number().int().nonnegative(),
  statusCounts: statusCountsSchema,
});
export type ReactionSetSummary = z.infer<typeof reactionSetSummarySchema>;

/** Query of `GET /api/teams/:teamId/reaction-sets` (viewer+): optional review-state filter. Ordered by most recently updated. */
export const reactionSetListQuerySchema = z.object({
  state: reviewStateSchema.optional(),
});
export type ReactionSetListQuery = z.infer<typeof reactionSetListQuerySchema>;

/** Answer of `GET /api/teams/:teamId/reaction-sets`. */
export const reactionSetListResponseSchema = z.array(reactionSetSummarySchema);
export type ReactionSetListResponse = z.infer<typeof reactionSetListResponseSchema>;

/** Body of `POST /api/teams/:teamId/reaction-sets` (editor+). */
export const createReactionSetRequestSchema = z.object({
  name: z.string().trim().min(1).max(200),
  description: z.string().max(4_000).optional(),
  site: z.string().max(200).optional(),
});
export type CreateReactionSetRequest = z.infer<typeof createReactionSetRequestSchema>;

/** Body of `PATCH /api/reaction-sets/:id` (editor+): changed fields and the version read (409 VERSION_CONFLICT when stale). */
export const updateReactionSetRequestSchema = createReactionSetRequestSchema.partial().extend({
  version: z.number().int().positive(),
});
export type UpdateReactionSetRequest = z.infer<typeof updateReactionSetRequestSchema>;

/** Review actions recorded with a set. */
export const REVIEW_ACTIONS = ['submitted', 'returned', 'approved'] as const;

/** One entry of a set's review history: a submission, a return with its comment, or an approval. */
export const reviewCommentSchema = z.object({
  id: z.uuid(),
  action: z.enum(REVIEW_ACTIONS),
  author: actorSchema.nullable(),
  comment: z.string(),
  /** Revision an approval created. */
  revision: z.number().int().positive().nullable(),
  createdAt: z.iso.datetime(),
});
export type ReviewComment = z.infer<typeof reviewCommentSchema>;

/** A vetted revision as a set lists it. */
export const revisionSummarySchema = z.object({
  number: z.number().int().positive(),
  vettedBy: actorSchema.nullable(),
  vettedAt: z.iso.datetime(),
  reactionCount: z.number().int().nonnegative(),
  /** Id of the library publication of this revision, if published. */
  publicationId: z.uuid().nullable(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

/** Answer of `GET /api/reaction-sets/:id` (viewer+): the set with its reactions (stored results), net reactions, review history and revisions. */
export const reactionSetDetailSchema = reactionSetSummarySchema.extend({
  reactions: z.array(reactionSchema),
  netReactions: z.array(netReactionSchema),
  comments: z.array(reviewCommentSchema),
  revisions: z.array(revisionSummarySchema),
});
export type ReactionSetDetail = z.infer<typeof reactionSetDetailSchema>;

/** Answer of reaction writes (POST, PATCH, DELETE): the reaction (absent after DELETE), the set's new header, and the recomputed net reactions. */
export const reactionWriteResponseSchema = z.object({
  reaction: reactionSchema.optional(),
  set: reactionSetHeaderSchema,
  netReactions: z.array(netReactionSchema),
});
export type ReactionWriteResponse = z.infer<typeof reactionWriteResponseSchema>;

/** Answer of net-reaction writes (POST, PATCH, DELETE): the net reaction (absent after DELETE) and the set's new header. */
export const netReactionWriteResponseSchema = z.object({
  netReaction: netReactionSchema.optional(),
  set: reactionSetHeaderSchema,
});
export type NetReactionWriteResponse = z.infer<typeof netReactionWriteResponseSchema>;

/**
 * Path of the client's page of a set; review e-mails link to `<origin><path>`.
 *
 * @example reactionSetPagePath('t1', 's1') // '/teams/t1/reaction-sets/s1'
 */
export function reactionSetPagePath(teamId: string, setId: string): string {
  return `/teams/${teamId}/reaction-sets/${setId}`;
}
