import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { AUDIT_ENTITY_TYPES } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';

/** Who did what to which record of a team, and when (`createdAt`). Written in the transaction of the write it records. */
export const AuditEvent = defineEntity({
  name: 'AuditEvent',
  tableName: 'audit_events',
  properties: {
    ...baseProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade'),
    actor: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
    /** `<entity>.<verb>`, e.g. `reaction.updated`. */
    action: p.string().length(60),
    entityType: p.enum([...AUDIT_ENTITY_TYPES]),
    entityId: p.string().length(60),
    summary: p.string().length(400),
  },
  indexes: [{ properties: ['team', 'createdAt'] }],
});

/** One recorded write. */
export type AuditEvent = InferEntity<typeof AuditEvent>;
