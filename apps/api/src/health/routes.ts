import type { EntityManager } from '@mikro-orm/postgresql';
import type { HealthResponse } from '@tallus/contracts';
import { Router } from 'express';
import { ServiceUnavailableError } from '../errors/app-errors';

/** `/api/health`: answers 200 when the database answers a query, 503 DATABASE_UNAVAILABLE otherwise. */
export function healthRoutes(em: EntityManager): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    const isDatabaseUp = await em
      .getConnection()
      .execute('select 1 as ok')
      .then(() => true, () => false);
    if (!isDatabaseUp) throw new ServiceUnavailableError('DATABASE_UNAVAILABLE', 'The database does not answer.');
    const body: HealthResponse = { status: 'ok', database: 'ok' };
    res.json(body);
  });
  return router;
}
