import type { EntityManager } from '@mikro-orm/postgresql';
import type { MassBalancePhase } from '@tallus/contracts';
import { BadRequestError } from '../errors/app-errors';
import { BUILTIN_SPECIES } from '../species/builtin-species';
import { Species } from '../species/species.entity';
import { WaterAnalysis } from '../water-analyses/water-analysis.entity';
import { MassBalanceModel, type StoredPhase } from './mass-balance-model.entity';
import { solveModel } from './solve-model';
import { waterForSolver } from './water-for-solver';

/**
 * Resolves candidate phases: a `speciesId` (team UUID or `builtin:<key>`) is
 * looked up and its formula kept beside it.
 *
 * @throws BadRequestError MASS_BALANCE_UNKNOWN_SPECIES with the path of each unknown id
 */
export async function resolvePhases(em: EntityManager, teamId: string, phases: readonly MassBalancePhase[]): Promise<StoredPhase[]> {
  const teamIds = phases.map((phase) => phase.speciesId).filter((id): id is string => id !== undefined && !id.startsWith('builtin:'));
  const uuids = teamIds.filter((id) => /^[0-9a-f-]{36}$/i.test(id));
  const teamSpecies = uuids.length === 0 ? [] : await em.find(Species, { team: teamId, id: { $in: uuids } });
  const issues: BadRequestError['issues'] = [];
  const resolved = phases.map((phase, index): StoredPhase => {
    const base = { name: phase.name, rule: phase.rule, speciesId: phase.speciesId ?? null, formula: phase.formula ?? null, equation: phase.equation ?? null };
    if (phase.speciesId === undefined) return base;
    const key = phase.speciesId.startsWith('builtin:') ? phase.speciesId.slice('builtin:'.length) : null;
    const formula = key !== null ? BUILTIN_SPECIES.find((entry) => entry.key === key)?.formula : teamSpecies.find((entry) => entry.id === phase.speciesId)?.formula;
    if (formula === undefined) issues.push({ code: 'MASS_BALANCE_UNKNOWN_SPECIES', message: `No species ${phase.speciesId} in the team's or the built-in catalogue.`, path: ['phases', index, 'speciesId'] });
    return { ...base, formula: formula ?? null };
  });
  if (issues.length > 0) throw new BadRequestError('MASS_BALANCE_UNKNOWN_SPECIES', 'A phase names a species that is not in the catalogue.', issues);
  return resolved;
}

/**
 * The team's water of that id.
 *
 * @throws BadRequestError MASS_BALANCE_UNKNOWN_WATER at `field`
 */
export async function findTeamWater(em: EntityManager, teamId: string, id: string, field: string): Promise<WaterAnalysis> {
  const water = await em.findOne(WaterAnalysis, { id, team: teamId });
  if (!water) {
    throw new BadRequestError('MASS_BALANCE_UNKNOWN_WATER', 'The model names a water analysis that is not in its team.', [
      { code: 'MASS_BALANCE_UNKNOWN_WATER', message: `No water analysis ${id} in this team.`, path: [field] },
    ]);
  }
  return water;
}

/** Solves a stored model again with its waters as they are now, and stores the result (flush is the caller's). */
export async function solveStoredModel(em: EntityManager, model: MassBalanceModel): Promise<void> {
  const initial = model.initialWater ? await em.findOneOrFail(WaterAnalysis, model.initialWater.id) : null;
  const final = await em.findOneOrFail(WaterAnalysis, model.finalWater.id);
  model.result = solveModel({ initial: waterForSolver(initial), final: waterForSolver(final), phases: model.phases, constraints: model.constraints, uncertainty: model.uncertainty });
}

/** Solves again every model that uses a water (after the water changed), in the caller's transaction. */
export async function resolveModelsOfWater(em: EntityManager, waterId: string): Promise<void> {
  const models = await em.find(MassBalanceModel, { $or: [{ initialWater: waterId }, { finalWater: waterId }] });
  for (const model of models) await solveStoredModel(em, model);
  await em.flush();
}
