import { MikroORM } from '@mikro-orm/postgresql';
import type { Config } from '../config/env';
import { createOrmOptions } from './mikro-orm.config';

/**
 * Connects to PostgreSQL and runs every pending migration.
 *
 * @param config parsed environment
 * @returns the ORM; close it with `orm.close()`
 * @throws when the database cannot be reached or a migration fails (nothing of a failed migration stays)
 */
export async function openDatabase(config: Config): Promise<MikroORM> {
  const orm = await MikroORM.init(createOrmOptions(config));
  await orm.migrator.up();
  return orm;
}
