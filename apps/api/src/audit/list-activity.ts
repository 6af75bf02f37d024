import type { EntityManager } from '@mikro-orm/postgresql';
import type { ActivityResponse } from '@tallus/contracts';
import { toActor } from '../users/to-actor';
import { AuditEvent } from './audit-event.entity';

/**
 * A team's most recent audit events, newest first.
 *
 * @param em request-scoped EntityManager
 * @param teamId the team
 * @param limit how many (1–200)
 */
export async function listActivity(em: EntityManager, teamId: string, limit: number): Promise<ActivityResponse> {
  const events = await em.find(AuditEvent, { team: teamId }, { orderBy: { createdAt: 'desc', id: 'asc' }, limit, populate: ['actor'] });
  return events.map((event) => ({
    id: event.id,
    teamId,
    actor: toActor(event.actor),
    action: event.action,
    entityType: event.entityType,
    entityId: event.entityId,
    summary: event.summary,
    at: event.createdAt.toISOString(),
  }));
}
