import { z } from 'zod';
import { emailSchema } from './auth';
import { roleSchema } from './roles';

/** Body of `POST /api/teams/:teamId/invitations` (owners only). */
export const createInvitationRequestSchema = z.object({
  email: emailSchema,
  role: roleSchema,
});
export type CreateInvitationRequest = z.infer<typeof createInvitationRequestSchema>;

/**
 * A pending invitation: the answer of POST (201) and each row of
 * `GET /api/teams/:teamId/invitations`. The token itself is only in the e-mail.
 */
export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  role: roleSchema,
  /** ISO 8601 date-time; 7 days after creation. */
  expiresAt: z.iso.datetime(),
  createdAt: z.iso.datetime(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** Answer of `GET /api/teams/:teamId/invitations`: pending ones, newest first. */
export const invitationListResponseSchema = z.array(invitationSchema);
export type InvitationListResponse = z.infer<typeof invitationListResponseSchema>;

/** Body of `POST /api/invitations/accept`: the token from the link in the e-mail. */
export const acceptInvitationRequestSchema = z.object({
  token: z.string().min(1).max(200),
});
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationRequestSchema>;

/** Answer of `POST /api/invitations/accept`: the team joined and the role in it. */
export const acceptInvitationResponseSchema = z.object({
  teamId: z.uuid(),
  teamName: z.string(),
  role: roleSchema,
});
export type AcceptInvitationResponse = z.infer<typeof acceptInvitationResponseSchema>;

/** Days an invitation stays valid. */
export const INVITATION_TTL_DAYS = 7;

/** Path of the client's page that accepts an invitation; the e-mail links to `<origin><path>?token=<token>`. */
export const INVITATION_ACCEPT_PATH = '/invitations/accept';
