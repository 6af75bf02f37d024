import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateReactionSetRequest, ReactionSetDetail, UpdateReactionSetRequest } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { assertVersion } from '../db/assert-version';
import { ConflictError } from '../errors/app-errors';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';
import { getReactionSet } from './get-reaction-set';
import { openSetForEdit } from './open-set-for-edit';
import { ReactionSet } from './reaction-set.entity';

/** Who creates which set in which team. */
export interface CreateReactionSetInput {
  teamId: string;
  actorId: string;
  request: CreateReactionSetRequest;
}

/** Creates an empty draft set. */
export async function createReactionSet(em: EntityManager, input: CreateReactionSetInput): Promise<ReactionSetDetail> {
  return em.transactional(async (tx) => {
    const actor = ref(tx.getReference(User, input.actorId));
    const set = tx.create(ReactionSet, {
      id: randomUUID(),
      team: ref(tx.getReference(Team, input.teamId)),
      name: input.request.name,
      description: input.request.description ?? '',
      site: input.request.site ?? '',
      createdBy: actor,
      updatedBy: actor,
    });
    recordAudit(tx, { teamId: input.teamId, actorId: input.actorId, action: 'reaction_set.created', entityType: 'reaction_set', entityId: set.id, summary: `Created reaction set "${set.name}"` });
    await tx.flush();
    return getReactionSet(tx, set.id);
  });
}

/** Who changes which set. */
export interface UpdateReactionSetInput {
  setId: string;
  actorId: string;
  request: UpdateReactionSetRequest;
}

/**
 * Changes a set's name, description or site. A vetted set becomes a draft.
 *
 * @throws ConflictError VERSION_CONFLICT when `version` is stale; REVIEW_LOCKED while under review
 */
export async function updateReactionSet(em: EntityManager, input: UpdateReactionSetInput): Promise<ReactionSetDetail> {
  return em.transactional(async (tx) => {
    const set = await openSetForEdit(tx, input.setId, input.actorId);
    assertVersion(set.version, input.request.version);
    const { name, description, site } = input.request;
    if (name !== undefined) set.name = name;
    if (description !== undefined) set.description = description;
    if (site !== undefined) set.site = site;
    recordAudit(tx, { teamId: set.team.id, actorId: input.actorId, action: 'reaction_set.updated', entityType: 'reaction_set', entityId: set.id, summary: `Changed reaction set "${set.name}"` });
    await tx.flush();
    return getReactionSet(tx, set.id);
  });
}

/**
 * Deletes a set that was never vetted, with its reactions and net reactions.
 *
 * @throws ConflictError REACTION_SET_HAS_REVISIONS when it has vetted revisions (they stay readable forever);
 *   REVIEW_LOCKED while under review
 */
export async function deleteReactionSet(em: EntityManager, setId: string, actorId: string): Promise<void> {
  await em.transactional(async (tx) => {
    const set = await openSetForEdit(tx, setId, actorId);
    if (set.currentRevision > 0) {
      throw new ConflictError('REACTION_SET_HAS_REVISIONS', 'This set has vetted revisions, which stay readable forever: it cannot be deleted.');
    }
    recordAudit(tx, { teamId: set.team.id, actorId, action: 'reaction_set.deleted', entityType: 'reaction_set', entityId: set.id, summary: `Deleted reaction set "${set.name}"` });
    tx.remove(set);
    await tx.flush();
  });
}
