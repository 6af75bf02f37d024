import { randomUUID } from 'node:crypto';
import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateWaterAnalysisRequest, TeamSettingsValues, UpdateWaterAnalysisRequest, WaterAnalysis as WaterAnalysisView } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { assertVersion } from '../db/assert-version';
import { ConflictError } from '../errors/app-errors';
import { takenNames } from '../site-data/taken-names';
import { resolveModelsOfWater } from '../mass-balance/solve-stored-model';
import { loadTeamSettings } from '../team-settings/load-team-settings';
import { Team } from '../teams/team.entity';
import { computeWaterFigures, toStoredSolutes } from './convert-water';
import { countModelUses } from './list-water-analyses';
import { toWaterView } from './to-water-view';
import { WaterAnalysis, type StoredSolute } from './water-analysis.entity';

/** Who adds which analysis to which team. */
export interface CreateWaterInput {
  teamId: string;
  actorId: string;
  request: CreateWaterAnalysisRequest;
}

/**
 * Adds water analyses to a team in the caller's transaction, after checking
 * every solute, unit and value with libs/chem and the names for duplicates.
 * Used by create (one) and the CSV import (many).
 *
 * @param input.settings the team's settings when the caller already has them (else loaded)
 * @throws ChemInputError at `solutes.<key>.…`; ConflictError WATER_ANALYSIS_DUPLICATE
 */
export async function addWaterAnalyses(
  tx: EntityManager,
  input: { teamId: string; actorId: string; requests: CreateWaterAnalysisRequest[]; action: string; settings?: TeamSettingsValues },
): Promise<WaterAnalysis[]> {
  const settings = input.settings ?? (await loadTeamSettings(tx, input.teamId));
  // One query for the whole batch; names added earlier in the batch join the set as they go.
  const taken = await takenNames(tx, 'water_analyses', input.teamId, input.requests.map((request) => request.name));
  const rows = [];
  for (const request of input.requests) {
    const solutes = toStoredSolutes(request.solutes);
    computeWaterFigures(solutes, request.pH, settings);
    if (taken.has(request.name)) throw duplicateName(request.name);
    taken.add(request.name);
    const row = tx.create(WaterAnalysis, {
      id: randomUUID(),
      team: ref(tx.getReference(Team, input.teamId)),
      name: request.name,
      site: request.site,
      sampledOn: request.sampledOn,
      temperatureC: request.temperatureC,
      ph: request.pH,
      solutes,
      notes: request.notes,
    });
    recordAudit(tx, { teamId: input.teamId, actorId: input.actorId, action: input.action, entityType: 'water_analysis', entityId: row.id, summary: `Added water analysis ${request.name}` });
    rows.push(row);
  }
  await tx.flush();
  return rows;
}

/**
 * Adds one water analysis.
 *
 * @throws ChemInputError at `solutes.<key>.value|unit`; ConflictError WATER_ANALYSIS_DUPLICATE
 */
export async function createWaterAnalysis(em: EntityManager, input: CreateWaterInput): Promise<WaterAnalysisView> {
  return em.transactional(async (tx) => {
    const settings = await loadTeamSettings(tx, input.teamId);
    const [row] = await addWaterAnalyses(tx, { teamId: input.teamId, actorId: input.actorId, requests: [input.request], action: 'water_analysis.created', settings });
    return toWaterView(row, settings, 0);
  });
}

/**
 * Changes a water analysis; when its solutes or name changed, the mass-balance
 * models that use it are solved again in the same transaction.
 *
 * @throws ConflictError VERSION_CONFLICT, WATER_ANALYSIS_DUPLICATE; ChemInputError
 */
export async function updateWaterAnalysis(em: EntityManager, input: { id: string; actorId: string; request: UpdateWaterAnalysisRequest }): Promise<WaterAnalysisView> {
  const { version, solutes, pH, ...fields } = input.request;
  return em.transactional(async (tx) => {
    const row = await tx.findOneOrFail(WaterAnalysis, input.id, { refresh: true });
    assertVersion(row.version, version);
    const teamId = row.team.id;
    const settings = await loadTeamSettings(tx, teamId);
    if (fields.name !== undefined && fields.name !== row.name && (await takenNames(tx, 'water_analyses', teamId, [fields.name])).size > 0) throw duplicateName(fields.name);
    const nextSolutes = solutes === undefined ? row.solutes : toStoredSolutes(solutes);
    const nextPh = pH === undefined ? (row.ph === null || row.ph === undefined ? null : Number(row.ph)) : pH;
    computeWaterFigures(nextSolutes, nextPh, settings);
    // The solver reads only the solutes and the name (waterForSolver): other edits leave the models as solved.
    const solverInputChanged = !sameSolutes(row.solutes, nextSolutes) || (fields.name !== undefined && fields.name !== row.name);
    Object.assign(row, Object.fromEntries(Object.entries(fields).filter(([, value]) => value !== undefined)), { solutes: nextSolutes, ph: nextPh });
    recordAudit(tx, { teamId, actorId: input.actorId, action: 'water_analysis.updated', entityType: 'water_analysis', entityId: row.id, summary: `Changed water analysis ${row.name}` });
    await tx.flush();
    if (solverInputChanged) await resolveModelsOfWater(tx, row.id);
    return toWaterView(row, settings, await countModelUses(tx, row.id));
  });
}

/**
 * Deletes a water analysis that no model uses.
 *
 * @throws ConflictError WATER_ANALYSIS_IN_USE
 */
export async function deleteWaterAnalysis(em: EntityManager, id: string, actorId: string): Promise<void> {
  await em.transactional(async (tx) => {
    const row = await tx.findOneOrFail(WaterAnalysis, id, { refresh: true });
    const uses = await countModelUses(tx, id);
    if (uses > 0) throw new ConflictError('WATER_ANALYSIS_IN_USE', `${uses} mass-balance model(s) use ${row.name}: delete or change them first.`);
    recordAudit(tx, { teamId: row.team.id, actorId, action: 'water_analysis.deleted', entityType: 'water_analysis', entityId: row.id, summary: `Deleted water analysis ${row.name}` });
    tx.remove(row);
    await tx.flush();
  });
}

/** Whether two stored solute maps hold the same values and units, whatever their key order (jsonb reorders keys). */
function sameSolutes(a: Readonly<Record<string, StoredSolute>>, b: Readonly<Record<string, StoredSolute>>): boolean {
  const keys = Object.keys(a);
  return keys.length === Object.keys(b).length && keys.every((key) => b[key] !== undefined && a[key]!.value === b[key]!.value && a[key]!.unit === b[key]!.unit);
}


function duplicateName(name: string): ConflictError {
  return new ConflictError('WATER_ANALYSIS_DUPLICATE', `The team already has a water analysis named "${name}".`);
}
