import { z } from 'zod';
import { actorSchema } from './activity';
import { netReactionSchema, reactionSchema } from './reactions';
import { reactionSetDetailSchema } from './reaction-sets';
import { speciesOxidationStatesSchema, speciesPhaseSchema } from './species';

/**
 * Review routes (DESIGN.md §5):
 * - `POST /api/reaction-sets/:id/submit` (editor+): from `draft` or `returned`, with ≥ 1 reaction.
 * - `POST /api/reaction-sets/:id/approve` (reviewer+, not the submitter: 403 REVIEW_SELF_APPROVAL):
 *   from `in_review`; freezes revision n+1 and makes the set `vetted`.
 * - `POST /api/reaction-sets/:id/return` (reviewer+, not the submitter): from `in_review`, with a comment.
 * Each sends e-mail: a submission to the team's reviewers and owners except the
 * submitter; a decision to the submitter.
 */

/** Body of submit: optional note to the reviewers and the version read (409 VERSION_CONFLICT when stale). */
export const submitReviewRequestSchema = z.object({
  comment: z.string().trim().max(4_000).optional(),
  version: z.number().int().positive().optional(),
});
export type SubmitReviewRequest = z.infer<typeof submitReviewRequestSchema>;

/** Body of approve: optional comment. */
export const approveReviewRequestSchema = submitReviewRequestSchema;
export type ApproveReviewRequest = z.infer<typeof approveReviewRequestSchema>;

/** Body of return: the comment is required. */
export const returnReviewRequestSchema = z.object({
  comment: z.string().trim().min(1).max(4_000),
  version: z.number().int().positive().optional(),
});
export type ReturnReviewRequest = z.infer<typeof returnReviewRequestSchema>;

/** Answer of submit, approve and return: the set after the step, and who was e-mailed. */
export const reviewStepResponseSchema = z.object({
  set: reactionSetDetailSchema,
  mail: z.object({
    /** Addresses the SMTP server accepted. */
    sent: z.array(z.string()),
    /** Addresses it could not be handed to; the step itself stands. */
    failed: z.array(z.string()),
  }),
});
export type ReviewStepResponse = z.infer<typeof reviewStepResponseSchema>;

/** A species as a revision froze it: the catalogue entry a reaction of the revision used. */
export const snapshotSpeciesSchema = z.object({
  /** UUID of the team species, or `builtin:<key>`. */
  id: z.string(),
  name: z.string(),
  formula: z.string(),
  phase: speciesPhaseSchema,
  oxidationStates: speciesOxidationStatesSchema.nullable(),
  source: z.string(),
  molarMass: z.number(),
});
export type SnapshotSpecies = z.infer<typeof snapshotSpeciesSchema>;

/** Answer of `GET /api/reaction-sets/:id/revisions/:n` (viewer+): an immutable snapshot of a vetted set. */
export const revisionSchema = z.object({
  setId: z.uuid(),
  number: z.number().int().positive(),
  vettedBy: actorSchema.nullable(),
  vettedAt: z.iso.datetime(),
  set: z.object({ name: z.string(), description: z.string(), site: z.string() }),
  reactions: z.array(reactionSchema),
  netReactions: z.array(netReactionSchema),
  species: z.array(snapshotSpeciesSchema),
});
export type Revision = z.infer<typeof revisionSchema>;

/** Answer of `GET /api/reaction-sets/:id/revisions` (viewer+): newest first. */
export const revisionListResponseSchema = z.array(
  revisionSchema.pick({ number: true, vettedBy: true, vettedAt: true }).extend({
    reactionCount: z.number().int().nonnegative(),
    publicationId: z.uuid().nullable(),
  }),
);
export type RevisionListResponse = z.infer<typeof revisionListResponseSchema>;
