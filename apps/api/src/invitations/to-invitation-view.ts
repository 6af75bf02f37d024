import type { Invitation as InvitationView } from '@tallus/contracts';
import type { Invitation } from './invitation.entity';

/** An invitation as responses show it: never the token or its hash. */
export function toInvitationView(invitation: Invitation): InvitationView {
  return {
    id: invitation.id,
    email: invitation.email,
    role: invitation.role,
    expiresAt: invitation.expiresAt.toISOString(),
    createdAt: invitation.createdAt.toISOString(),
  };
}
