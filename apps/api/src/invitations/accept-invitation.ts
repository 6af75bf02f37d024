import { LockMode, ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { AcceptInvitationResponse } from '@tallus/contracts';
import { ConflictError, ForbiddenError, GoneError, NotFoundError } from '../errors/app-errors';
import { Membership } from '../teams/membership.entity';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';
import { Invitation } from './invitation.entity';
import { hashInvitationToken } from './invitation-token';

/**
 * Makes the signed-in user a member with the invited role. The invitation row
 * is locked for the transaction, so two concurrent accepts cannot both succeed.
 *
 * @param em request-scoped EntityManager
 * @param user the signed-in user; their e-mail address must be the invited one
 * @param token the token from the e-mail's link
 * @throws NotFoundError INVITATION_NOT_FOUND for an unknown (or replaced) token
 * @throws ForbiddenError INVITATION_WRONG_USER when the user's address is not the invited one
 * @throws ConflictError INVITATION_USED when it was accepted before
 * @throws GoneError INVITATION_EXPIRED past its expiry
 * @throws ConflictError INVITATION_ALREADY_MEMBER when the user is already in the team
 */
export async function acceptInvitation(em: EntityManager, user: User, token: string): Promise<AcceptInvitationResponse> {
  return em.transactional(async (tx) => {
    const invitation = await tx.findOne(
      Invitation,
      { tokenHash: hashInvitationToken(token) },
      { lockMode: LockMode.PESSIMISTIC_WRITE, refresh: true },
    );
    if (!invitation) throw new NotFoundError('INVITATION_NOT_FOUND', 'This invitation does not exist or was replaced by a newer one.');
    if (invitation.email !== user.email) {
      throw new ForbiddenError('INVITATION_WRONG_USER', 'This invitation is for another e-mail address; sign in with the invited one.');
    }
    if (invitation.acceptedAt) throw new ConflictError('INVITATION_USED', 'This invitation has already been accepted.');
    if (invitation.expiresAt.getTime() <= Date.now()) throw new GoneError('INVITATION_EXPIRED', 'This invitation has expired; ask the owner for a new one.');
    if ((await tx.count(Membership, { team: invitation.team, user: user.id })) > 0) {
      throw new ConflictError('INVITATION_ALREADY_MEMBER', 'You are already a member of this team.');
    }
    const team = await tx.findOneOrFail(Team, { id: invitation.team.id });
    const member = tx.getReference(User, user.id);
    tx.create(Membership, { team, user: member, role: invitation.role });
    invitation.acceptedAt = new Date();
    invitation.acceptedBy = ref(member);
    await tx.flush();
    return { teamId: team.id, teamName: team.name, role: invitation.role };
  });
}
