import type { EntityManager } from '@mikro-orm/postgresql';
import type { Member, Role } from '@tallus/contracts';
import { MembershipRepository } from './membership.repository';
import { toMemberView } from './to-member-view';

/** Who changes whose role to what. */
export interface ChangeMemberRoleInput {
  teamId: string;
  /** The owner making the change. */
  actorId: string;
  /** The member whose role changes. */
  userId: string;
  role: Role;
}

/**
 * Gives a member another role, in one transaction with the team locked.
 *
 * @throws NotFoundError MEMBER_NOT_FOUND
 * @throws ConflictError TEAM_LAST_OWNER when the last owner would stop being one
 * @throws ForbiddenError TEAM_ROLE_REQUIRED when the actor stopped being an owner meanwhile
 */
export async function changeMemberRole(em: EntityManager, input: ChangeMemberRoleInput): Promise<Member> {
  return em.transactional(async (tx) => {
    const memberships = new MembershipRepository(tx);
    await memberships.lockTeam(input.teamId);
    await memberships.assertStillOwner(input.teamId, input.actorId);
    const member = await memberships.getMember(input.teamId, input.userId);
    if (input.role !== 'owner') await memberships.assertNotLastOwner(member);
    member.role = input.role;
    await tx.flush();
    return toMemberView(member);
  });
}
