import { z } from 'zod';
import { roleSchema } from './roles';

/** A team id in a route; anything else answers 404, like a team the caller cannot see. */
export const teamIdSchema = z.uuid();

/** Body of `POST /api/teams`. */
export const createTeamRequestSchema = z.object({
  name: z.string().trim().min(1).max(120),
});
export type CreateTeamRequest = z.infer<typeof createTeamRequestSchema>;

/** A team with the caller's role in it: `POST /api/teams` (201), `GET /api/teams/:teamId`, and each row of `GET /api/teams`. */
export const teamSummarySchema = z.object({
  id: z.uuid(),
  name: z.string(),
  role: roleSchema,
});
export type TeamSummary = z.infer<typeof teamSummarySchema>;

/** Answer of `GET /api/teams`, ordered by team name. */
export const teamListResponseSchema = z.array(teamSummarySchema);
export type TeamListResponse = z.infer<typeof teamListResponseSchema>;

/** One member: each row of `GET /api/teams/:teamId/members` and the answer of PATCH. */
export const memberSchema = z.object({
  userId: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  /** ISO 8601 date-time. */
  joinedAt: z.iso.datetime(),
});
export type Member = z.infer<typeof memberSchema>;

/** Answer of `GET /api/teams/:teamId/members`, owners first, then by display name. */
export const memberListResponseSchema = z.array(memberSchema);
export type MemberListResponse = z.infer<typeof memberListResponseSchema>;

/** Body of `PATCH /api/teams/:teamId/members/:userId`. */
export const updateMemberRequestSchema = z.object({
  role: roleSchema,
});
export type UpdateMemberRequest = z.infer<typeof updateMemberRequestSchema>;
