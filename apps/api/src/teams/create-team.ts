import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateTeamRequest, TeamSummary } from '@tallus/contracts';
import type { User } from '../users/user.entity';
import { Membership } from './membership.entity';
import { Team } from './team.entity';

/**
 * Creates a team with its creator as owner, in one transaction.
 *
 * @param em request-scoped EntityManager
 * @param creator the signed-in user
 * @param input the team's name
 */
export async function createTeam(em: EntityManager, creator: User, input: CreateTeamRequest): Promise<TeamSummary> {
  const team = em.create(Team, { name: input.name });
  em.create(Membership, { team, user: creator, role: 'owner' });
  await em.flush();
  return { id: team.id, name: team.name, role: 'owner' };
}
