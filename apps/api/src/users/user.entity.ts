import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { baseProperties } from '../db/base-properties';

/** A person who signs in. The e-mail address is stored lower-cased and is unique. */
export const User = defineEntity({
  name: 'User',
  tableName: 'users',
  properties: {
    ...baseProperties,
    email: p.string().length(254).unique(),
    displayName: p.string().length(80),
    /** bcrypt hash; never leaves the server. */
    passwordHash: p.string().length(72).hidden().lazy(true, false),
  },
});

/** A person who signs in. */
export type User = InferEntity<typeof User>;
