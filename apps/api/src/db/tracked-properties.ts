import { p } from '@mikro-orm/core';

/**
 * Properties of the records users edit, composed into their entities next to
 * `baseProperties`: when they last changed, and a version for optimistic locking
 * (MikroORM adds `where version = ?` to every update and raises
 * OptimisticLockError when the row moved on; 409 VERSION_CONFLICT).
 */
export const trackedProperties = {
  updatedAt: p
    .datetime()
    .onCreate(() => new Date())
    .onUpdate(() => new Date()),
  version: p.integer().version(),
};
