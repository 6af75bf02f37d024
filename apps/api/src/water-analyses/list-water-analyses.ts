import type { EntityManager } from '@mikro-orm/postgresql';
import type { TeamSettingsValues, WaterAnalysis as WaterAnalysisView } from '@tallus/contracts';
import { loadTeamSettings } from '../team-settings/load-team-settings';
import { toWaterView } from './to-water-view';
import { WaterAnalysis } from './water-analysis.entity';

/** How many mass-balance models use a water, as initial or final. */
export async function countModelUses(em: EntityManager, waterId: string): Promise<number> {
  const rows = await em.execute<Array<{ count: string }>>('select count(*) as count from mass_balance_models where initial_water_id = ? or final_water_id = ?', [waterId, waterId]);
  return Number(rows[0]?.count ?? 0);
}

async function usesByWater(em: EntityManager, teamId: string): Promise<Map<string, number>> {
  const rows = await em.execute<Array<{ water_id: string; count: string }>>(
    `select water_id, count(*) as count from (
       select initial_water_id as water_id from mass_balance_models where team_id = ? and initial_water_id is not null
       union all select final_water_id from mass_balance_models where team_id = ?) uses group by water_id`,
    [teamId, teamId],
  );
  return new Map(rows.map((row) => [row.water_id, Number(row.count)]));
}

/**
 * The team's water analyses (optionally of one site), by site, date and name, with their figures.
 *
 * @param settings the team's settings when the caller already has them (else loaded)
 */
export async function listWaterAnalyses(em: EntityManager, teamId: string, site?: string, settings?: TeamSettingsValues): Promise<WaterAnalysisView[]> {
  const rows = await em.find(WaterAnalysis, { team: teamId, ...(site === undefined ? {} : { site }) }, { orderBy: { site: 'asc', sampledOn: 'asc', name: 'asc' } });
  const teamSettings = settings ?? (await loadTeamSettings(em, teamId));
  const uses = await usesByWater(em, teamId);
  return rows.map((row) => toWaterView(row, teamSettings, uses.get(row.id) ?? 0));
}

/** One water analysis with its figures. */
export async function getWaterAnalysis(em: EntityManager, id: string): Promise<WaterAnalysisView> {
  const row = await em.findOneOrFail(WaterAnalysis, id);
  return toWaterView(row, await loadTeamSettings(em, row.team.id), await countModelUses(em, id));
}
