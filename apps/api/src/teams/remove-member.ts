import type { EntityManager } from '@mikro-orm/postgresql';
import { MembershipRepository } from './membership.repository';

/** Who removes whom from which team. */
export interface RemoveMemberInput {
  teamId: string;
  /** The owner removing the member (may be the member themselves). */
  actorId: string;
  userId: string;
}

/**
 * Removes a member from a team, in one transaction with the team locked.
 *
 * @throws NotFoundError MEMBER_NOT_FOUND
 * @throws ConflictError TEAM_LAST_OWNER when the member is the last owner
 * @throws ForbiddenError TEAM_ROLE_REQUIRED when the actor stopped being an owner meanwhile
 */
export async function removeMember(em: EntityManager, input: RemoveMemberInput): Promise<void> {
  await em.transactional(async (tx) => {
    const memberships = new MembershipRepository(tx);
    await memberships.lockTeam(input.teamId);
    await memberships.assertStillOwner(input.teamId, input.actorId);
    const member = await memberships.getMember(input.teamId, input.userId);
    await memberships.assertNotLastOwner(member);
    tx.remove(member);
    await tx.flush();
  });
}
