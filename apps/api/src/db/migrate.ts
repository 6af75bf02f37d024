/**
 * `npm run -w apps/api db:migrate`: runs the pending migrations against the
 * database of the TALLUS_DB_* variables, then exits. main.ts does the same at start-up.
 */
import { loadConfig } from '../config/env';
import { openDatabase } from './open-database';

const config = loadConfig();
const orm = await openDatabase(config);
const executed = await orm.migrator.getExecutedMigrations();
console.log(`Database ${config.database.name} is up to date (${executed.length} migrations applied).`);
await orm.close();
