import { LockMode } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import { ConflictError, ForbiddenError, NotFoundError } from '../errors/app-errors';
import { Membership } from './membership.entity';
import { Team } from './team.entity';

/** Queries on memberships that the team use cases share. */
export class MembershipRepository {
  constructor(private readonly em: EntityManager) {}

  /**
   * Locks the team's row until the transaction ends, so that concurrent
   * changes of its members run one after the other (the last-owner rule
   * depends on a stable count of owners). Call inside a transaction.
   */
  async lockTeam(teamId: string): Promise<void> {
    await this.em.findOneOrFail(Team, { id: teamId }, { lockMode: LockMode.PESSIMISTIC_WRITE });
  }

  /**
   * Re-reads the acting owner's membership after {@link lockTeam}: their role may have changed since the request began.
   *
   * @throws ForbiddenError TEAM_ROLE_REQUIRED when they are no longer an owner
   */
  async assertStillOwner(teamId: string, userId: string): Promise<void> {
    const membership = await this.em.findOne(Membership, { team: teamId, user: userId }, { refresh: true });
    if (membership?.role !== 'owner') throw new ForbiddenError('TEAM_ROLE_REQUIRED', 'This needs the owner role in the team.');
  }

  /**
   * The membership of one user in one team, with the user.
   *
   * @throws NotFoundError MEMBER_NOT_FOUND
   */
  async getMember(teamId: string, userId: string): Promise<Membership> {
    const membership = await this.em.findOne(Membership, { team: teamId, user: userId }, { populate: ['user'], refresh: true });
    if (!membership) throw new NotFoundError('MEMBER_NOT_FOUND', 'No such member in this team.');
    return membership;
  }

  /**
   * Refuses a change that would take the owner role from the team's last owner.
   *
   * @param member the membership about to lose its owner role (or be removed)
   * @throws ConflictError TEAM_LAST_OWNER
   */
  async assertNotLastOwner(member: Membership): Promise<void> {
    if (member.role !== 'owner') return;
    const owners = await this.em.count(Membership, { team: member.team, role: 'owner' });
    if (owners <= 1) {
      throw new ConflictError('TEAM_LAST_OWNER', 'A team keeps at least one owner: make another member owner first.');
    }
  }
}
