import type { EntityManager } from '@mikro-orm/postgresql';
import type { CreateRockSampleRequest, RockSampleCsvImportResponse, RockSampleCsvPreview } from '@tallus/contracts';
import { previewTable, rowsToImport, unreadablePreview } from '../site-data/csv-preview';
import { readCsvTable } from '../site-data/csv-table';
import { loadTeamSettings } from '../team-settings/load-team-settings';
import { rockCsvLayout } from './rock-csv';
import { RockSample } from './rock-sample.entity';
import { addRockSamples } from './save-rock-sample';
import { toRockView } from './to-rock-view';

/** Every problem of a rock-sample CSV by line and column; saves nothing. */
export async function previewRockCsv(em: EntityManager, teamId: string, file: Buffer): Promise<RockSampleCsvPreview> {
  const table = readCsvTable(file);
  if ('issues' in table) return unreadablePreview<CreateRockSampleRequest>(table.issues);
  const saved = await em.find(RockSample, { team: teamId }, { fields: ['name'] });
  return previewTable(table, rockCsvLayout(table.header), new Set(saved.map((row) => row.name)));
}

/**
 * Imports a rock-sample CSV in one transaction: all rows when all are valid;
 * with `skipInvalid` the valid ones; otherwise nothing.
 *
 * @throws BadRequestError IMPORT_INVALID with every issue at `[line, column]`
 */
export async function importRockCsv(em: EntityManager, input: { teamId: string; actorId: string; file: Buffer; skipInvalid: boolean }): Promise<RockSampleCsvImportResponse> {
  const preview = await previewRockCsv(em, input.teamId, input.file);
  const { requests, skippedLines } = rowsToImport(preview, input.skipInvalid);
  return em.transactional(async (tx) => {
    const settings = await loadTeamSettings(tx, input.teamId);
    const rows = await addRockSamples(tx, { teamId: input.teamId, actorId: input.actorId, requests, action: 'rock_sample.imported', settings });
    return { created: rows.map((row) => toRockView(row, settings)), skippedLines };
  });
}
