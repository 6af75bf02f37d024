import type { EntityManager } from '@mikro-orm/postgresql';
import { INVITATION_TTL_DAYS, type CreateInvitationRequest, type Invitation as InvitationView } from '@tallus/contracts';
import { ConflictError } from '../errors/app-errors';
import type { Mailer } from '../mail/mailer';
import { Membership } from '../teams/membership.entity';
import type { Team } from '../teams/team.entity';
import type { User } from '../users/user.entity';
import { composeInvitationEmail } from './compose-invitation-email';
import { Invitation } from './invitation.entity';
import { createInvitationToken, hashInvitationToken } from './invitation-token';
import { toInvitationView } from './to-invitation-view';

/** Who invites whom to which team. */
export interface CreateInvitationInput {
  team: Team;
  inviter: User;
  request: CreateInvitationRequest;
  publicOrigin: string;
}

/**
 * Invites an e-mail address into a team with a role and sends the e-mail with
 * the single-use link. A newer invitation replaces pending ones for the same
 * address and team, so only the latest link works. When the e-mail cannot be
 * sent, the invitation is withdrawn and the error propagates.
 *
 * @throws ConflictError INVITATION_ALREADY_MEMBER when the address belongs to a member
 */
export async function createInvitation(em: EntityManager, mailer: Mailer, input: CreateInvitationInput): Promise<InvitationView> {
  const { team, inviter, request } = input;
  if ((await em.count(Membership, { team, user: { email: request.email } })) > 0) {
    throw new ConflictError('INVITATION_ALREADY_MEMBER', 'This e-mail address already belongs to a member of the team.');
  }
  const token = createInvitationToken();
  const createdAt = new Date();
  const expiresAt = new Date(createdAt.getTime() + INVITATION_TTL_DAYS * 24 * 3600_000);
  const invitation = await em.transactional(async (tx) => {
    await tx.nativeDelete(Invitation, { team, email: request.email, acceptedAt: null });
    const created = tx.create(Invitation, {
      team,
      email: request.email,
      role: request.role,
      tokenHash: hashInvitationToken(token),
      invitedBy: inviter,
      createdAt,
      expiresAt,
    });
    await tx.flush();
    return created;
  });
  const message = composeInvitationEmail({
    to: request.email,
    teamName: team.name,
    inviterName: inviter.displayName,
    role: request.role,
    token,
    expiresAt,
    publicOrigin: input.publicOrigin,
  });
  await mailer.send(message).catch(async (error: unknown) => {
    await em.nativeDelete(Invitation, { id: invitation.id });
    throw error;
  });
  return toInvitationView(invitation);
}
