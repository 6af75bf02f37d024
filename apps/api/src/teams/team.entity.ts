import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { baseProperties } from '../db/base-properties';

/** A group of users who own reaction sets, species and site data. */
export const Team = defineEntity({
  name: 'Team',
  tableName: 'teams',
  properties: {
    ...baseProperties,
    name: p.string().length(120),
  },
});

/** A group of users who own reaction sets, species and site data. */
export type Team = InferEntity<typeof Team>;
