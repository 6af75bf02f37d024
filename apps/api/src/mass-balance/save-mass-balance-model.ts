import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateMassBalanceModelRequest, MassBalanceModel as MassBalanceModelView, UpdateMassBalanceModelRequest } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { assertVersion } from '../db/assert-version';
import { Team } from '../teams/team.entity';
import { MassBalanceModel } from './mass-balance-model.entity';
import { findTeamWater, resolvePhases, solveStoredModel } from './solve-stored-model';
import { toModelView } from './to-model-view';

/** Who adds which model to which team. */
export interface CreateModelInput {
  teamId: string;
  actorId: string;
  request: CreateMassBalanceModelRequest;
}

/**
 * Adds a mass-balance model and stores its solution (libs/chem). A model whose
 * phases or constraints the engine refuses is saved with status `invalid`.
 *
 * @throws BadRequestError MASS_BALANCE_UNKNOWN_WATER, MASS_BALANCE_UNKNOWN_SPECIES
 */
export async function createMassBalanceModel(em: EntityManager, input: CreateModelInput): Promise<MassBalanceModelView> {
  const { request } = input;
  return em.transactional(async (tx) => {
    const initial = request.initialWaterId === null ? null : await findTeamWater(tx, input.teamId, request.initialWaterId, 'initialWaterId');
    const final = await findTeamWater(tx, input.teamId, request.finalWaterId, 'finalWaterId');
    const model = tx.create(MassBalanceModel, {
      id: randomUUID(),
      team: ref(tx.getReference(Team, input.teamId)),
      name: request.name,
      description: request.description,
      initialWater: initial ? ref(initial) : null,
      finalWater: ref(final),
      phases: await resolvePhases(tx, input.teamId, request.phases),
      constraints: request.constraints,
      uncertainty: request.uncertainty,
      result: { status: 'invalid', constraints: [], change: {}, models: [], notes: [], error: null, initial: { analysisId: null, name: '', mmolPerKg: {} }, final: { analysisId: null, name: '', mmolPerKg: {} }, assumptions: [], solvedAt: new Date().toISOString() },
    });
    await solveStoredModel(tx, model);
    recordAudit(tx, { teamId: input.teamId, actorId: input.actorId, action: 'mass_balance_model.created', entityType: 'mass_balance_model', entityId: model.id, summary: `Added mass-balance model ${model.name} (${model.result.status}, ${model.result.models.length} model(s))` });
    await tx.flush();
    return toModelView(model);
  });
}

/**
 * Changes a model and solves it again.
 *
 * @throws ConflictError VERSION_CONFLICT; BadRequestError as {@link createMassBalanceModel}
 */
export async function updateMassBalanceModel(em: EntityManager, input: { id: string; actorId: string; request: UpdateMassBalanceModelRequest }): Promise<MassBalanceModelView> {
  const { request } = input;
  return em.transactional(async (tx) => {
    const model = await tx.findOneOrFail(MassBalanceModel, input.id, { refresh: true });
    assertVersion(model.version, request.version);
    const teamId = model.team.id;
    if (request.initialWaterId !== undefined) model.initialWater = request.initialWaterId === null ? null : ref(await findTeamWater(tx, teamId, request.initialWaterId, 'initialWaterId'));
    if (request.finalWaterId !== undefined) model.finalWater = ref(await findTeamWater(tx, teamId, request.finalWaterId, 'finalWaterId'));
    if (request.phases !== undefined) model.phases = await resolvePhases(tx, teamId, request.phases);
    if (request.name !== undefined) model.name = request.name;
    if (request.description !== undefined) model.description = request.description;
    if (request.constraints !== undefined) model.constraints = request.constraints;
    if (request.uncertainty !== undefined) model.uncertainty = request.uncertainty;
    await solveStoredModel(tx, model);
    recordAudit(tx, { teamId, actorId: input.actorId, action: 'mass_balance_model.updated', entityType: 'mass_balance_model', entityId: model.id, summary: `Changed mass-balance model ${model.name}` });
    await tx.flush();
    return toModelView(model);
  });
}

/** Solves a model again with its waters as they are now (after they were edited) and stores the result. */
export async function resolveMassBalanceModel(em: EntityManager, id: string, actorId: string): Promise<MassBalanceModelView> {
  return em.transactional(async (tx) => {
    const model = await tx.findOneOrFail(MassBalanceModel, id, { refresh: true });
    await solveStoredModel(tx, model);
    recordAudit(tx, { teamId: model.team.id, actorId, action: 'mass_balance_model.solved', entityType: 'mass_balance_model', entityId: model.id, summary: `Solved mass-balance model ${model.name} again` });
    await tx.flush();
    return toModelView(model);
  });
}

/** Deletes a model. */
export async function deleteMassBalanceModel(em: EntityManager, id: string, actorId: string): Promise<void> {
  await em.transactional(async (tx) => {
    const model = await tx.findOneOrFail(MassBalanceModel, id, { refresh: true });
    recordAudit(tx, { teamId: model.team.id, actorId, action: 'mass_balance_model.deleted', entityType: 'mass_balance_model', entityId: model.id, summary: `Deleted mass-balance model ${model.name}` });
    tx.remove(model);
    await tx.flush();
  });
}
