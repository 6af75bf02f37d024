import { fileURLToPath } from 'node:url';
import { Migrator } from '@mikro-orm/migrations';
import { defineConfig, type Options } from '@mikro-orm/postgresql';
import { loadConfig, type Config } from '../config/env';
import { ENTITIES } from './entities';
import { MIGRATIONS } from './migrations-list';

/** Folder the CLI writes new migrations to (source tree; the running app uses {@link MIGRATIONS}). */
const MIGRATIONS_FOLDER = fileURLToPath(new URL('./migrations', import.meta.url));

/**
 * MikroORM options for the given settings: explicit entities and migrations,
 * no discovery, no debug output.
 *
 * @param config parsed environment
 */
export function createOrmOptions(config: Config): Options {
  return defineConfig({
    host: config.database.host,
    port: config.database.port,
    dbName: config.database.name,
    user: config.database.user,
    password: config.database.password,
    entities: ENTITIES,
    discovery: { warnWhenNoEntities: true },
    extensions: [Migrator],
    migrations: {
      path: MIGRATIONS_FOLDER,
      pathTs: MIGRATIONS_FOLDER,
      migrationsList: MIGRATIONS,
      emit: 'ts',
      snapshot: true,
      snapshotName: '.snapshot-tallus',
      transactional: true,
      allOrNothing: true,
      silent: true,
    },
    pool: { min: 0, max: 10 },
    debug: false,
  });
}

/** Used by the MikroORM CLI (`npm run db:migration:create`, see apps/api/package.json). */
export default createOrmOptions(loadConfig());
