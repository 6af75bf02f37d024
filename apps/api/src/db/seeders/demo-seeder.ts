import type { EntityManager } from '@mikro-orm/postgresql';
import bcrypt from 'bcryptjs';
import { Membership } from '../../teams/membership.entity';
import { Team } from '../../teams/team.entity';
import { User } from '../../users/user.entity';
import { DEMO_ACCOUNTS, DEMO_PASSWORD, DEMO_TEAMS } from './demo-accounts';
import { seedDemoReactionSets } from './seed-demo-reaction-sets';
import { seedDemoSiteData } from './seed-demo-site-data';

/** What one seeding run added. */
export interface DemoSeedResult {
  usersCreated: number;
  teamsCreated: number;
  membershipsCreated: number;
  reactionSetsCreated: number;
  /** Water analyses, rock samples, mass-balance models and mineral formulas added. */
  siteRecordsCreated: number;
}

/**
 * Loads the invented demo scenario (DESIGN.md §6): accounts, teams and
 * memberships in one transaction, then the demo reaction sets.
 * Idempotent: only what is missing is added; existing accounts, teams and
 * memberships (also their passwords and roles, which the demo may have
 * changed) are left as they are. A team is found by its name among the teams
 * its demo owner belongs to.
 *
 * @param em an EntityManager (a fork is used)
 * @param bcryptCost cost of the password hash of new accounts
 */
export async function seedDemo(em: EntityManager, bcryptCost: number): Promise<DemoSeedResult> {
  const result: DemoSeedResult = { usersCreated: 0, teamsCreated: 0, membershipsCreated: 0, reactionSetsCreated: 0, siteRecordsCreated: 0 };
  const passwordHash = await bcrypt.hash(DEMO_PASSWORD, bcryptCost);
  await em.fork().transactional(async (tx) => {
    const users = new Map<string, User>();
    for (const account of DEMO_ACCOUNTS) {
      let user = await tx.findOne(User, { email: account.email });
      if (!user) {
        user = tx.create(User, { email: account.email, displayName: account.displayName, passwordHash });
        result.usersCreated++;
      }
      users.set(account.email, user);
    }
    await tx.flush();
    for (const demoTeam of DEMO_TEAMS) {
      const accounts = DEMO_ACCOUNTS.filter((account) => account.team === demoTeam.name);
      const owner = users.get(accounts.find((account) => account.role === 'owner')!.email)!;
      const ownerMembership = await tx.findOne(Membership, { user: owner, team: { name: demoTeam.name } }, { populate: ['team'] });
      let team = ownerMembership?.team.getEntity();
      if (!team) {
        team = tx.create(Team, { name: demoTeam.name });
        result.teamsCreated++;
      }
      for (const account of accounts) {
        const user = users.get(account.email)!;
        if ((await tx.count(Membership, { team, user })) === 0) {
          tx.create(Membership, { team, user, role: account.role });
          result.membershipsCreated++;
        }
      }
      await tx.flush();
    }
  });
  // After the accounts commit: the sets go through the review use cases, each step its own transaction.
  result.reactionSetsCreated = await seedDemoReactionSets(em.fork());
  result.siteRecordsCreated = await seedDemoSiteData(em.fork());
  return result;
}
