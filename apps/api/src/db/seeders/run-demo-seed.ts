/**
 * `npm run -w apps/api db:seed`: migrates, then loads the invented demo teams
 * (idempotent) into the database of the TALLUS_DB_* variables, and prints the sign-ins.
 */
import { loadConfig } from '../../config/env';
import { openDatabase } from '../open-database';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from './demo-accounts';
import { seedDemo } from './demo-seeder';

const config = loadConfig();
const orm = await openDatabase(config);
const result = await seedDemo(orm.em, config.bcryptCost);
console.log(
  `Demo data in ${config.database.name}: ${result.usersCreated} users, ${result.teamsCreated} teams, ${result.membershipsCreated} memberships, ${result.reactionSetsCreated} reaction sets, ${result.siteRecordsCreated} site records added.`,
);
console.log(`Sign in with any of these (password ${DEMO_PASSWORD}):`);
for (const account of DEMO_ACCOUNTS) console.log(`  ${account.team.padEnd(15)} ${account.role.padEnd(9)} ${account.email}`);
await orm.close();
