import { CSV_MAX_ROWS, type CsvIssue } from '@tallus/contracts';
import Papa from 'papaparse';

/** A CSV file as header and data rows; `line` is the 1-based line of the file. */
export interface CsvTable {
  header: string[];
  rows: Array<{ line: number; cells: string[] }>;
}

/**
 * Reads an uploaded CSV (UTF-8, optional BOM, comma or semicolon as papaparse
 * detects). Blank lines are skipped; line numbers count them.
 *
 * @returns the table, or the file-level issues (unreadable, no header, too many rows)
 */
export function readCsvTable(buffer: Buffer): CsvTable | { issues: CsvIssue[] } {
  const text = buffer.toString('utf8').replace(/^\uFEFF/, '');
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: false });
  // An undetectable delimiter (a one-column file) falls back to the comma: only broken quoting is fatal.
  const fatal = parsed.errors.filter((error) => error.type === 'Quotes');
  if (fatal.length > 0) {
    return { issues: fatal.map((error) => ({ code: 'CSV_PARSE', message: error.message, line: (error.row ?? -1) + 1, column: null })) };
  }
  const [header = [], ...data] = parsed.data;
  if (header.every((cell) => cell.trim() === '')) return { issues: [{ code: 'CSV_PARSE', message: 'The file has no header line.', line: 1, column: null }] };
  const rows = data.map((cells, index) => ({ line: index + 2, cells })).filter((row) => row.cells.some((cell) => cell.trim() !== ''));
  if (rows.length > CSV_MAX_ROWS) return { issues: [{ code: 'CSV_TOO_MANY_ROWS', message: `At most ${CSV_MAX_ROWS} rows per file (this one has ${rows.length}).`, line: 0, column: null }] };
  return { header: header.map((cell) => cell.trim()), rows };
}

/**
 * Reads a numeric cell: empty is null (not measured).
 *
 * @returns the number, null, or an issue for text that is not a number within [min, max]
 */
export function readNumberCell(text: string, where: { line: number; column: string; min: number; max: number }): number | null | CsvIssue {
  const trimmed = text.trim();
  if (trimmed === '') return null;
  const value = Number(trimmed);
  if (!/^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/.test(trimmed) || !Number.isFinite(value) || value < where.min || value > where.max) {
    return { code: 'CSV_BAD_VALUE', message: `"${trimmed}" is not a number from ${where.min} to ${where.max}.`, line: where.line, column: where.column };
  }
  return value;
}

/** Whether a cell reader answered with an issue. */
export function isCsvIssue(value: unknown): value is CsvIssue {
  return typeof value === 'object' && value !== null && 'code' in value && 'line' in value;
}

/**
 * Writes rows as CSV (RFC 4180 quoting by papaparse), with a header line, each
 * line ended by `newline` (`\n` unless told).
 * Cells that start with `=`, `+`, `-` or `@` and are not numbers are prefixed with `'`,
 * so a spreadsheet does not run them as formulas.
 */
export function writeCsv(header: readonly string[], rows: ReadonlyArray<ReadonlyArray<string | number | boolean | null>>, options: { newline?: '\n' | '\r\n' } = {}): string {
  const newline = options.newline ?? '\n';
  const safe = (cell: string | number | boolean | null): string => {
    if (cell === null) return '';
    const text = String(cell);
    return /^[=+\-@]/.test(text) && !Number.isFinite(Number(text)) ? `'${text}` : text;
  };
  return `${Papa.unparse({ fields: [...header], data: rows.map((row) => row.map(safe)) }, { newline })}${newline}`;
}
