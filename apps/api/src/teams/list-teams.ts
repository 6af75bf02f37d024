import type { EntityManager } from '@mikro-orm/postgresql';
import type { TeamSummary } from '@tallus/contracts';
import type { User } from '../users/user.entity';
import { Membership } from './membership.entity';

/**
 * The teams a user belongs to, with their role, by name.
 *
 * @param em request-scoped EntityManager
 * @param user the signed-in user
 */
export async function listTeams(em: EntityManager, user: User): Promise<TeamSummary[]> {
  const memberships = await em.find(Membership, { user }, { populate: ['team'], orderBy: { team: { name: 'asc' }, id: 'asc' } });
  return memberships.map((membership) => ({ id: membership.team.id, name: membership.team.getEntity().name, role: membership.role }));
}
