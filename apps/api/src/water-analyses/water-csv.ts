import { findSolute, isChemError, parseConcentration, SOLUTES, toMillimolesPerLitre } from '@tallus/chem';
import { createWaterAnalysisRequestSchema, WATER_CSV_FIXED_COLUMNS, type CreateWaterAnalysisRequest, type CsvColumn, type CsvIssue, type WaterAnalysis } from '@tallus/contracts';
import type { CsvLayout, RowReading } from '../site-data/csv-preview';
import { isCsvIssue, readNumberCell, writeCsv } from '../site-data/csv-table';

/** Request field of each fixed column. */
const FIELD_OF: Record<(typeof WATER_CSV_FIXED_COLUMNS)[number], keyof CreateWaterAnalysisRequest> = {
  sample: 'name',
  site: 'site',
  date: 'sampledOn',
  temperature_c: 'temperatureC',
  ph: 'pH',
  notes: 'notes',
};

/** Columns the export adds after the solutes; the import skips every `computed:` column. */
const COMPUTED_COLUMNS = ['computed:cations_meq_l', 'computed:anions_meq_l', 'computed:cbe_percent', 'computed:cbe_flagged', 'computed:notes'] as const;

const SOLUTE_HEADER = /^(\S+)\s*\((.+)\)$/;

/** Place of each solute key in the export's columns: the libs/chem catalogue order (cations, anions, neutral). */
const SOLUTE_ORDER: ReadonlyMap<string, number> = new Map(SOLUTES.map((solute, index) => [solute.key, index]));

function readHeader(header: string, index: number): { column: CsvColumn; issue?: CsvIssue } {
  const fixed = WATER_CSV_FIXED_COLUMNS.find((name) => name === header.toLowerCase());
  if (fixed) return { column: { index, header, kind: 'field', key: FIELD_OF[fixed], unit: null } };
  if (header.startsWith('computed:')) return { column: { index, header, kind: 'field', key: null, unit: null } };
  const match = SOLUTE_HEADER.exec(header);
  const unknown = { index, header, kind: 'unknown' as const, key: null, unit: null };
  if (!match) return { column: unknown, issue: { code: 'CSV_UNKNOWN_COLUMN', message: `"${header}" is neither a fixed column (${WATER_CSV_FIXED_COLUMNS.join(', ')}) nor "<solute> (<unit>)".`, line: 1, column: header } };
  const [, key, unit] = match;
  const solute = findSolute(key);
  if (!solute) return { column: unknown, issue: { code: 'CSV_UNKNOWN_SOLUTE', message: `Unknown solute "${key}".`, line: 1, column: header } };
  try {
    toMillimolesPerLitre(solute, 1, unit.trim());
  } catch (error) {
    if (!isChemError(error)) throw error;
    return { column: unknown, issue: { code: 'CSV_BAD_UNIT', message: error.message, line: 1, column: header } };
  }
  return { column: { index, header, kind: 'value', key, unit: unit.trim() } };
}

function headerIssuesOf(columns: CsvColumn[], found: CsvIssue[]): CsvIssue[] {
  const seen = new Map<string, string>();
  const issues = [...found];
  for (const column of columns) {
    // One solute may have a column per unit (the export writes them so); a row may fill only one of them.
    const identity = column.kind === 'value' ? `solute:${column.key}:${column.unit}` : column.kind === 'field' && column.key ? `field:${column.key}` : null;
    if (identity === null) continue;
    if (seen.has(identity)) issues.push({ code: 'CSV_DUPLICATE_COLUMN', message: `"${column.header}" gives the same ${column.kind === 'value' ? 'solute' : 'column'} as "${seen.get(identity)}".`, line: 1, column: column.header });
    else seen.set(identity, column.header);
  }
  if (!columns.some((column) => column.key === 'name')) issues.push({ code: 'CSV_MISSING_VALUE', message: 'The header needs a "sample" column.', line: 1, column: null });
  return issues;
}

function readFixed(column: CsvColumn, text: string, line: number, fields: Record<string, unknown>, issues: CsvIssue[]): void {
  const ranges: Record<string, [number, number]> = { temperatureC: [-5, 400], pH: [-2, 16] };
  const range = column.key ? ranges[column.key] : undefined;
  if (range) {
    const value = readNumberCell(text, { line, column: column.header, min: range[0], max: range[1] });
    if (isCsvIssue(value)) issues.push(value);
    else fields[column.key!] = value;
    return;
  }
  if (column.key === 'sampledOn') {
    const trimmed = text.trim();
    if (trimmed !== '' && !/^\d{4}-\d{2}-\d{2}$/.test(trimmed)) issues.push({ code: 'CSV_BAD_VALUE', message: `"${trimmed}" is not a date YYYY-MM-DD.`, line, column: column.header });
    fields.sampledOn = trimmed === '' ? null : trimmed;
    return;
  }
  if (column.key) fields[column.key] = text.trim();
}

function readRow(columns: CsvColumn[], cells: readonly string[], line: number): RowReading<CreateWaterAnalysisRequest> {
  const fields: Record<string, unknown> = {};
  const solutes: Record<string, { value: string; unit: string }> = {};
  const issues: CsvIssue[] = [];
  for (const column of columns) {
    const text = cells[column.index] ?? '';
    if (column.kind === 'field') readFixed(column, text, line, fields, issues);
    if (column.kind !== 'value' || text.trim() === '') continue;
    if (solutes[column.key!]) {
      issues.push({ code: 'CSV_BAD_VALUE', message: `${column.key} is given twice in this row (${solutes[column.key!].unit} and ${column.unit}).`, line, column: column.header });
      continue;
    }
    try {
      parseConcentration(text.trim());
      solutes[column.key!] = { value: text.trim(), unit: column.unit! };
    } catch (error) {
      if (!isChemError(error)) throw error;
      issues.push({ code: 'CSV_BAD_VALUE', message: error.message, line, column: column.header });
    }
  }
  const name = typeof fields.name === 'string' ? fields.name : '';
  if (name === '') issues.push({ code: 'CSV_MISSING_VALUE', message: 'Every row needs a sample name.', line, column: 'sample' });
  if (solutes.HCO3 && solutes.alkalinity) issues.push({ code: 'CSV_BAD_VALUE', message: 'Give bicarbonate as HCO3 or as alkalinity, not both.', line, column: null });
  const parsed = createWaterAnalysisRequestSchema.safeParse({ ...fields, solutes });
  if (!parsed.success && issues.length === 0) {
    issues.push(...parsed.error.issues.map((issue) => ({ code: 'CSV_BAD_VALUE' as const, message: issue.message, line, column: String(issue.path[0] ?? '') || null })));
  }
  return { name, request: parsed.success && issues.length === 0 ? parsed.data : null, issues };
}

/** The water-analysis CSV layout for a header (see `WATER_CSV_FIXED_COLUMNS` in the contracts). */
export function waterCsvLayout(header: readonly string[]): CsvLayout<CreateWaterAnalysisRequest> {
  const read = header.map((text, index) => readHeader(text, index));
  const columns = read.map((entry) => entry.column);
  const headerIssues = headerIssuesOf(columns, read.flatMap((entry) => (entry.issue ? [entry.issue] : [])));
  return { columns, headerIssues, readRow: (cells, line) => readRow(columns, cells, line) };
}

function round(value: number | null, digits = 4): number | null {
  return value === null ? null : Number(value.toFixed(digits));
}

/** Analyses as CSV in the import layout, with the computed charge balance after the solutes. */
export function waterAnalysesCsv(analyses: readonly WaterAnalysis[]): string {
  const soluteColumns = [...new Set(analyses.flatMap((analysis) => Object.entries(analysis.solutes).map(([key, entry]) => `${key} (${entry.unit})`)))];
  const order = (header: string) => SOLUTE_ORDER.get(SOLUTE_HEADER.exec(header)?.[1] ?? '') ?? SOLUTE_ORDER.size;
  soluteColumns.sort((a, b) => order(a) - order(b) || a.localeCompare(b));
  const rows = analyses.map((analysis) => [
    analysis.name,
    analysis.site,
    analysis.sampledOn,
    analysis.temperatureC,
    analysis.pH,
    analysis.notes,
    ...soluteColumns.map((header) => {
      const [, key, unit] = SOLUTE_HEADER.exec(header)!;
      const entry = analysis.solutes[key];
      return entry && entry.unit === unit ? entry.value : null;
    }),
    round(analysis.chargeBalance.cationsMeq),
    round(analysis.chargeBalance.anionsMeq),
    round(analysis.chargeBalance.cbePercent, 2),
    analysis.chargeBalance.flagged,
    analysis.chargeBalance.notes.map((note) => note.code).join(' '),
  ]);
  return writeCsv([...WATER_CSV_FIXED_COLUMNS, ...soluteColumns, ...COMPUTED_COLUMNS], rows);
}

/** The downloadable template: the layout with the usual solutes and one invented example row. */
export function waterCsvTemplate(): string {
  const solutes = ['Ca (mg/L)', 'Mg (mg/L)', 'Na (mg/L)', 'K (mg/L)', 'Fe (mg/L)', 'Mn (mg/L)', 'Al (mg/L)', 'SiO2 (mg/L)', 'Cl (mg/L)', 'SO4 (mg/L)', 'NO3 (mg/L)', 'F (mg/L)', 'alkalinity (mg/L as CaCO3)', 'DIC (mg/L)'];
  const example = ['EXAMPLE-1 (invented; delete this row)', 'Example site', '2026-01-15', 12.5, 7.2, 'below detection written as <limit', 40.1, 12.2, 9.8, 2.1, '<0.01', 0.05, '<0.02', 11.3, 8.9, 96.1, 1.2, 0.3, 120, 30.5];
  return writeCsv([...WATER_CSV_FIXED_COLUMNS, ...solutes], [example]);
}
