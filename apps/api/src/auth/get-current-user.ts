import type { EntityManager } from '@mikro-orm/postgresql';
import type { MeResponse } from '@tallus/contracts';
import { Membership } from '../teams/membership.entity';
import type { User } from '../users/user.entity';
import { toUserView } from '../users/to-user-view';

/**
 * The signed-in user and the teams they belong to, by team name.
 *
 * @param em request-scoped EntityManager
 * @param user the signed-in user
 */
export async function getCurrentUser(em: EntityManager, user: User): Promise<MeResponse> {
  const memberships = await em.find(Membership, { user }, { populate: ['team'], orderBy: { team: { name: 'asc' } } });
  return {
    user: toUserView(user),
    memberships: memberships.map((membership) => ({
      teamId: membership.team.id,
      teamName: membership.team.getEntity().name,
      role: membership.role,
    })),
  };
}
