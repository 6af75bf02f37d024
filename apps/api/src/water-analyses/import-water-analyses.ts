import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateWaterAnalysisRequest, WaterAnalysisCsvImportResponse, WaterAnalysisCsvPreview } from '@tallus/contracts';
import { previewTable, rowsToImport, unreadablePreview } from '../site-data/csv-preview';
import { readCsvTable } from '../site-data/csv-table';
import { loadTeamSettings } from '../team-settings/load-team-settings';
import { addWaterAnalyses } from './save-water-analysis';
import { toWaterView } from './to-water-view';
import { WaterAnalysis } from './water-analysis.entity';
import { waterCsvLayout } from './water-csv';

/** Every problem of a water-analysis CSV by line and column; saves nothing. */
export async function previewWaterCsv(em: EntityManager, teamId: string, file: Buffer): Promise<WaterAnalysisCsvPreview> {
  const table = readCsvTable(file);
  if ('issues' in table) return unreadablePreview<CreateWaterAnalysisRequest>(table.issues);
  const saved = await em.find(WaterAnalysis, { team: teamId }, { fields: ['name'] });
  return previewTable(table, waterCsvLayout(table.header), new Set(saved.map((row) => row.name)));
}

/**
 * Imports a water-analysis CSV in one transaction: all rows when all are valid;
 * with `skipInvalid` the valid ones; otherwise nothing.
 *
 * @throws BadRequestError IMPORT_INVALID with every issue at `[line, column]`
 */
export async function importWaterCsv(em: EntityManager, input: { teamId: string; actorId: string; file: Buffer; skipInvalid: boolean }): Promise<WaterAnalysisCsvImportResponse> {
  const preview = await previewWaterCsv(em, input.teamId, input.file);
  const { requests, skippedLines } = rowsToImport(preview, input.skipInvalid);
  return em.transactional(async (tx) => {
    const settings = await loadTeamSettings(tx, input.teamId);
    const rows = await addWaterAnalyses(tx, { teamId: input.teamId, actorId: input.actorId, requests, action: 'water_analysis.imported', settings });
    return { created: rows.map((row) => toWaterView(row, settings, 0)), skippedLines };
  });
}
