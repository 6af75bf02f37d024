import { defineEntity, p, type InferEntity } from '@mikro-orm/core';

/**
 * A session token signed out before its expiry, by its `jti`. Kept until the
 * token would have expired anyway, then pruned.
 */
export const RevokedToken = defineEntity({
  name: 'RevokedToken',
  tableName: 'revoked_tokens',
  properties: {
    jti: p.uuid().primary(),
    expiresAt: p.datetime().index(),
  },
});

/** A session token signed out before its expiry. */
export type RevokedToken = InferEntity<typeof RevokedToken>;
