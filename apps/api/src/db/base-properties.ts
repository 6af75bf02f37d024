import { randomUUID } from 'node:crypto';
import { p } from '@mikro-orm/core';

/**
 * Properties every entity shares, composed into each `defineEntity` (as the
 * MikroORM 6.5 notes advise over inheritance): a random UUID key, set in the
 * application so it is known before the insert, and the creation time.
 */
export const baseProperties = {
  id: p.uuid().primary().onCreate(() => randomUUID()),
  createdAt: p.datetime().onCreate(() => new Date()),
};
