import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { AuditEvent as AuditEventView } from '@tallus/contracts';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';
import { AuditEvent } from './audit-event.entity';

/** What one audit event says. */
export interface AuditEntry {
  teamId: string;
  /** The acting user; null for system writes. */
  actorId: string | null;
  action: string;
  entityType: AuditEventView['entityType'];
  entityId: string;
  summary: string;
}

/**
 * Adds an audit event to the unit of work of `em`: call it inside the
 * transaction of the write it records, so both commit or neither does.
 */
export function recordAudit(em: EntityManager, entry: AuditEntry): void {
  em.create(AuditEvent, {
    team: ref(em.getReference(Team, entry.teamId)),
    actor: entry.actorId ? ref(em.getReference(User, entry.actorId)) : null,
    action: entry.action,
    entityType: entry.entityType,
    entityId: entry.entityId,
    summary: entry.summary.slice(0, 400),
  });
}
