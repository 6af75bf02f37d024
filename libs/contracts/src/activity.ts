import { z } from 'zod';

/** A user as records name them: who wrote, vetted, published. */
export const actorSchema = z.object({
  id: z.uuid(),
  displayName: z.string(),
});
export type Actor = z.infer<typeof actorSchema>;

/** Kinds of records an audit event is about. */
export const AUDIT_ENTITY_TYPES = [
  'species',
  'reaction_set',
  'reaction',
  'net_reaction',
  'revision',
  'publication',
  'team_settings',
  'water_analysis',
  'mass_balance_model',
  'rock_sample',
  'mineral_formula',
] as const;
export const auditEntityTypeSchema = z.enum(AUDIT_ENTITY_TYPES);

/**
 * One audit event: who did what to which record, when. `action` is
 * `<entity>.<verb>`, e.g. `reaction.updated`, `reaction_set.approved`,
 * `publication.created`, `reaction_set.imported`.
 */
export const auditEventSchema = z.object({
  id: z.uuid(),
  teamId: z.uuid(),
  /** `null` when the user has since been deleted. */
  actor: actorSchema.nullable(),
  action: z.string(),
  entityType: auditEntityTypeSchema,
  entityId: z.string(),
  /** One English line for the activity list, e.g. `Added reaction "Pyrite oxidation by O2"`. */
  summary: z.string(),
  at: z.iso.datetime(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

/** Query of `GET /api/teams/:teamId/activity` (any member): newest first. */
export const activityQuerySchema = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(30),
});
export type ActivityQuery = z.infer<typeof activityQuerySchema>;

/** Answer of `GET /api/teams/:teamId/activity`. */
export const activityResponseSchema = z.array(auditEventSchema);
export type ActivityResponse = z.infer<typeof activityResponseSchema>;
