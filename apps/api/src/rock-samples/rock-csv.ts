import { findOxide } from '@tallus/chem';
import { createRockSampleRequestSchema, ROCK_CSV_FIXED_COLUMNS, type CreateRockSampleRequest, type CsvColumn, type CsvIssue, type RockSample } from '@tallus/contracts';
import type { CsvLayout, RowReading } from '../site-data/csv-preview';
import { isCsvIssue, readNumberCell, writeCsv } from '../site-data/csv-table';

/** Request field and numeric range of each fixed column (null range: text). */
const FIXED: Record<(typeof ROCK_CSV_FIXED_COLUMNS)[number], { field: keyof CreateRockSampleRequest; range: [number, number] | null }> = {
  sample: { field: 'name', range: null },
  site: { field: 'site', range: null },
  depth_from_m: { field: 'depthFromM', range: [0, 10_000] },
  depth_to_m: { field: 'depthToM', range: [0, 10_000] },
  lithology: { field: 'lithology', range: null },
  total_s_pct: { field: 'totalSulfurPercent', range: [0, 100] },
  sulfide_s_pct: { field: 'sulfideSulfurPercent', range: [0, 100] },
  sulfate_s_pct: { field: 'sulfateSulfurPercent', range: [0, 100] },
  np_kg_caco3_t: { field: 'neutralisationPotential', range: [0, 2_000] },
  paste_ph: { field: 'pastePh', range: [0, 14] },
  notes: { field: 'notes', range: null },
};

function readHeader(header: string, index: number): { column: CsvColumn; issue?: CsvIssue } {
  const fixed = ROCK_CSV_FIXED_COLUMNS.find((name) => name === header.toLowerCase());
  if (fixed) return { column: { index, header, kind: 'field', key: FIXED[fixed].field, unit: null } };
  if (header.startsWith('computed:')) return { column: { index, header, kind: 'field', key: null, unit: null } };
  const unknown = { index, header, kind: 'unknown' as const, key: null, unit: null };
  const [prefix, key = ''] = header.split(/:(.*)/s);
  if (prefix === 'mode' && key.trim() !== '') return { column: { index, header, kind: 'value', key: `mode:${key.trim()}`, unit: 'wt%' } };
  if (prefix === 'oxide' && findOxide(key.trim())) return { column: { index, header, kind: 'value', key: `oxide:${key.trim()}`, unit: 'wt%' } };
  if (prefix === 'oxide') return { column: unknown, issue: { code: 'CSV_UNKNOWN_COLUMN', message: `Unknown oxide "${key}".`, line: 1, column: header } };
  return { column: unknown, issue: { code: 'CSV_UNKNOWN_COLUMN', message: `"${header}" is neither a fixed column (${ROCK_CSV_FIXED_COLUMNS.join(', ')}) nor mode:<mineral> or oxide:<oxide>.`, line: 1, column: header } };
}

function readRow(columns: CsvColumn[], cells: readonly string[], line: number): RowReading<CreateRockSampleRequest> {
  const fields: Record<string, unknown> = { modes: [] as unknown[] };
  const oxides: Record<string, number> = {};
  const issues: CsvIssue[] = [];
  for (const column of columns) {
    const text = cells[column.index] ?? '';
    if (column.kind === 'unknown' || column.key === null) continue;
    const fixed = Object.values(FIXED).find((entry) => entry.field === column.key);
    if (fixed && fixed.range === null) {
      fields[column.key] = text.trim();
      continue;
    }
    const value = readNumberCell(text, { line, column: column.header, min: fixed?.range?.[0] ?? 0, max: fixed?.range?.[1] ?? 100 });
    if (isCsvIssue(value)) issues.push(value);
    else if (fixed) fields[column.key] = value;
    else if (value !== null && column.key.startsWith('mode:')) (fields.modes as unknown[]).push({ mineral: column.key.slice(5), weightPercent: value });
    else if (value !== null) oxides[column.key.slice(6)] = value;
  }
  if (Object.keys(oxides).length > 0) fields.oxides = oxides;
  const name = typeof fields.name === 'string' ? fields.name : '';
  if (name === '') issues.push({ code: 'CSV_MISSING_VALUE', message: 'Every row needs a sample name.', line, column: 'sample' });
  const parsed = createRockSampleRequestSchema.safeParse(fields);
  if (!parsed.success && issues.length === 0) issues.push(...parsed.error.issues.map((issue) => ({ code: 'CSV_BAD_VALUE' as const, message: issue.message, line, column: String(issue.path[0] ?? '') || null })));
  return { name, request: parsed.success && issues.length === 0 ? parsed.data : null, issues };
}

/** The rock-sample CSV layout for a header (see `ROCK_CSV_FIXED_COLUMNS` in the contracts). */
export function rockCsvLayout(header: readonly string[]): CsvLayout<CreateRockSampleRequest> {
  const read = header.map((text, index) => readHeader(text, index));
  const columns = read.map((entry) => entry.column);
  const issues = read.flatMap((entry) => (entry.issue ? [entry.issue] : []));
  const seen = new Set<string>();
  for (const column of columns) {
    if (column.key === null) continue;
    if (seen.has(column.key)) issues.push({ code: 'CSV_DUPLICATE_COLUMN', message: `"${column.header}" appears twice.`, line: 1, column: column.header });
    seen.add(column.key);
  }
  if (!seen.has('name')) issues.push({ code: 'CSV_MISSING_VALUE', message: 'The header needs a "sample" column.', line: 1, column: null });
  return { columns, headerIssues: issues, readRow: (cells, line) => readRow(columns, cells, line) };
}

const round = (value: number | null | undefined, digits = 3): number | null => (value === null || value === undefined ? null : Number(value.toFixed(digits)));

/** Columns the export adds: the ABA table and CO2 figures. */
export const ROCK_COMPUTED_COLUMNS = [
  'computed:ap_basis',
  'computed:ap_kg_caco3_t',
  'computed:nnp_kg_caco3_t',
  'computed:npr',
  'computed:class',
  'computed:mineral_ap_kg_caco3_t',
  'computed:mineral_np_kg_caco3_t',
  'computed:mineral_class',
  'computed:co2_modes_bicarbonate_t_t',
  'computed:co2_modes_carbonate_t_t',
  'computed:co2_oxides_bicarbonate_kg_t',
  'computed:co2_oxides_carbonate_kg_t',
  'computed:flags',
] as const;

/** Samples as CSV in the import layout, with the ABA table and CO2 figures after the measured columns. */
export function rockSamplesCsv(samples: readonly RockSample[]): string {
  const modeColumns = [...new Set(samples.flatMap((sample) => sample.modes.map((mode) => `mode:${mode.mineral}`)))];
  const oxideColumns = [...new Set(samples.flatMap((sample) => Object.keys(sample.oxides ?? {}).map((key) => `oxide:${key}`)))];
  const rows = samples.map((sample) => [
    sample.name,
    sample.site,
    sample.depthFromM,
    sample.depthToM,
    sample.lithology,
    sample.totalSulfurPercent,
    sample.sulfideSulfurPercent,
    sample.sulfateSulfurPercent,
    sample.neutralisationPotential,
    sample.pastePh,
    sample.notes,
    ...modeColumns.map((header) => sample.modes.filter((mode) => `mode:${mode.mineral}` === header).reduce<number | null>((sum, mode) => (sum ?? 0) + mode.weightPercent, null)),
    ...oxideColumns.map((header) => sample.oxides?.[header.slice(6)] ?? null),
    sample.aba?.sulfurBasis ?? null,
    round(sample.aba?.acidPotential),
    round(sample.aba?.netNeutralisationPotential),
    round(sample.aba?.neutralisationPotentialRatio),
    sample.aba?.classification ?? null,
    round(sample.mineralAba?.acidPotential),
    round(sample.mineralAba?.neutralisationPotential),
    sample.mineralAba?.classification ?? null,
    round(sample.co2.fromModes?.bicarbonate, 4),
    round(sample.co2.fromModes?.carbonate, 4),
    round(sample.co2.fromOxides?.bicarbonateKgPerTonne, 1),
    round(sample.co2.fromOxides?.carbonateKgPerTonne, 1),
    sample.flags.map((flag) => flag.code).join(' '),
  ]);
  return writeCsv([...ROCK_CSV_FIXED_COLUMNS, ...modeColumns, ...oxideColumns, ...ROCK_COMPUTED_COLUMNS], rows);
}

/** The downloadable template with one invented example row. */
export function rockCsvTemplate(): string {
  const extra = ['mode:pyrite', 'mode:calcite', 'mode:siderite', 'mode:Mg2SiO4', 'oxide:CaO', 'oxide:MgO', 'oxide:Na2O', 'oxide:K2O', 'oxide:CO2'];
  const example = ['EXAMPLE-1 (invented; delete this row)', 'Example pit', 12, 14, 'andesite', 1.2, 1.05, 0.1, 18.5, 6.8, '', 2.0, 1.5, 0.3, '', 6.2, 3.1, 2.9, 1.4, 0.6];
  return writeCsv([...ROCK_CSV_FIXED_COLUMNS, ...extra], [example]);
}
