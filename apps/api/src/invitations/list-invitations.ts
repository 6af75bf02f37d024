import type { EntityManager } from '@mikro-orm/postgresql';
import type { Invitation as InvitationView } from '@tallus/contracts';
import { Invitation } from './invitation.entity';
import { toInvitationView } from './to-invitation-view';

/**
 * A team's pending invitations (neither accepted nor expired), newest first.
 *
 * @param em request-scoped EntityManager
 * @param teamId the team
 */
export async function listInvitations(em: EntityManager, teamId: string): Promise<InvitationView[]> {
  const invitations = await em.find(
    Invitation,
    { team: teamId, acceptedAt: null, expiresAt: { $gt: new Date() } },
    { orderBy: { createdAt: 'desc', id: 'asc' } },
  );
  return invitations.map(toInvitationView);
}
