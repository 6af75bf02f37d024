import type { EntityManager } from '@mikro-orm/postgresql';
import { ROLES, type Member } from '@tallus/contracts';
import { Membership } from './membership.entity';
import { toMemberView } from './to-member-view';

/**
 * A team's members: owners first, then by role, then by display name.
 *
 * @param em request-scoped EntityManager
 * @param teamId the team
 */
export async function listMembers(em: EntityManager, teamId: string): Promise<Member[]> {
  const memberships = await em.find(Membership, { team: teamId }, { populate: ['user'] });
  return memberships
    .map(toMemberView)
    .sort((a, b) => ROLES.indexOf(a.role) - ROLES.indexOf(b.role) || a.displayName.localeCompare(b.displayName) || a.email.localeCompare(b.email));
}
