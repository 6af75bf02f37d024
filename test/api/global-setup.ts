import { MikroORM } from '@mikro-orm/postgresql';
import { loadConfig } from '../../apps/api/src/config/env';
import { createOrmOptions } from '../../apps/api/src/db/mikro-orm.config';
import { testEnvironment } from './support/test-environment';

/**
 * Runs once per `vitest run`: empties the test database (drops and recreates
 * its `public` schema) and applies every migration, exactly as main.ts would.
 * Refuses to touch a database whose name does not contain "test".
 */
export default async function setup(): Promise<void> {
  const config = loadConfig(testEnvironment());
  if (!config.database.name.includes('test')) {
    throw new Error(`Refusing to wipe database "${config.database.name}": API tests need a database whose name contains "test".`);
  }
  const orm = await MikroORM.init(createOrmOptions(config));
  try {
    await orm.em.getConnection().execute('drop schema if exists public cascade; create schema public;');
    await orm.migrator.up();
  } finally {
    await orm.close();
  }
}
