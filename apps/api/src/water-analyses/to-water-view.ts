import type { TeamSettingsValues, WaterAnalysis as WaterAnalysisView } from '@tallus/contracts';
import { computeWaterFigures } from './convert-water';
import type { WaterAnalysis } from './water-analysis.entity';

/**
 * A water analysis as responses show it, with conversions and the charge balance computed now.
 *
 * @param usedByModels how many mass-balance models use it
 */
export function toWaterView(row: WaterAnalysis, settings: TeamSettingsValues, usedByModels: number): WaterAnalysisView {
  const ph = row.ph === null || row.ph === undefined ? null : Number(row.ph);
  return {
    id: row.id,
    teamId: row.team.id,
    name: row.name,
    site: row.site,
    sampledOn: row.sampledOn ?? null,
    temperatureC: row.temperatureC === null || row.temperatureC === undefined ? null : Number(row.temperatureC),
    pH: ph,
    solutes: row.solutes,
    notes: row.notes,
    ...computeWaterFigures(row.solutes, ph, settings),
    usedByModels,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}
