import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { ROLES } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { User } from '../users/user.entity';
import { Team } from './team.entity';

/** A user's place in a team, with their role. One per user and team; `createdAt` is when they joined. */
export const Membership = defineEntity({
  name: 'Membership',
  tableName: 'memberships',
  properties: {
    ...baseProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade'),
    user: () => p.manyToOne(User).ref().deleteRule('cascade').index(),
    role: p.enum([...ROLES]),
  },
  uniques: [{ properties: ['team', 'user'] }],
});

/** A user's place in a team, with their role. */
export type Membership = InferEntity<typeof Membership>;
