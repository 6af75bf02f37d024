import type { CsvColumn, CsvIssue } from '@tallus/contracts';
import { BadRequestError } from '../errors/app-errors';
import type { CsvTable } from './csv-table';

/** What a layout made of one data row. */
export interface RowReading<Request> {
  name: string;
  request: Request | null;
  issues: CsvIssue[];
}

/** A preview before the duplicates are known to the caller's type. */
export interface CsvPreview<Request> {
  columns: CsvColumn[];
  rows: Array<{ line: number; name: string; isValid: boolean; request: Request | null; issues: CsvIssue[] }>;
  issues: CsvIssue[];
  validCount: number;
  invalidCount: number;
}

/** How one CSV layout reads its header and rows. */
export interface CsvLayout<Request> {
  columns: CsvColumn[];
  headerIssues: CsvIssue[];
  readRow(cells: readonly string[], line: number): RowReading<Request>;
}

/**
 * Builds the preview of a table: every row read by the layout, then the
 * duplicate names in the file and among the team's saved records. With a header
 * issue every row is invalid (its columns cannot be trusted).
 *
 * @param savedNames names the team already has
 */
export function previewTable<Request>(table: CsvTable, layout: CsvLayout<Request>, savedNames: ReadonlySet<string>): CsvPreview<Request> {
  const firstLine = new Map<string, number>();
  const rows = table.rows.map(({ line, cells }) => {
    const reading = layout.readRow(cells, line);
    const issues = [...reading.issues];
    const name = reading.name;
    if (name !== '' && firstLine.has(name)) issues.push({ code: 'CSV_DUPLICATE_IN_FILE', message: `Sample "${name}" is also on line ${firstLine.get(name)}.`, line, column: layout.columns[0]?.header ?? null });
    else if (name !== '') firstLine.set(name, line);
    if (savedNames.has(name)) issues.push({ code: 'CSV_DUPLICATE_SAVED', message: `The team already has a sample named "${name}".`, line, column: layout.columns[0]?.header ?? null });
    const isValid = issues.length === 0 && layout.headerIssues.length === 0 && reading.request !== null;
    return { line, name, isValid, request: isValid ? reading.request : null, issues };
  });
  const validCount = rows.filter((row) => row.isValid).length;
  return { columns: layout.columns, rows, issues: [...layout.headerIssues, ...rows.flatMap((row) => row.issues)], validCount, invalidCount: rows.length - validCount };
}

/** A preview of a file that could not be read at all. */
export function unreadablePreview<Request>(issues: CsvIssue[]): CsvPreview<Request> {
  return { columns: [], rows: [], issues, validCount: 0, invalidCount: 0 };
}

/**
 * The requests to save on confirm: every row when all are valid; only the
 * valid rows with `skipInvalid`; otherwise nothing, and 400 with every issue.
 * A file or header issue (line 0 or 1) or a parse error always refuses the file.
 *
 * @throws BadRequestError IMPORT_INVALID with issues at `[line, column]`
 */
export function rowsToImport<Request>(preview: CsvPreview<Request>, skipInvalid: boolean): { requests: Request[]; skippedLines: number[] } {
  // Line 0 is the whole file and line 1 its header: a row left out cannot mend either, whatever the code.
  const hasFileIssues = preview.issues.some((issue) => issue.line <= 1 || issue.code === 'CSV_PARSE');
  const noRows = preview.rows.length === 0;
  if (hasFileIssues || noRows || (preview.invalidCount > 0 && !skipInvalid)) {
    const issues = noRows && preview.issues.length === 0 ? [{ code: 'CSV_PARSE', message: 'The file has no data rows.', line: 0, column: null }] : preview.issues;
    throw new BadRequestError(
      'IMPORT_INVALID',
      `The file has ${issues.length} problem${issues.length === 1 ? '' : 's'}; nothing was saved.`,
      issues.map((issue) => ({ code: issue.code, message: issue.message, path: issue.column === null ? [issue.line] : [issue.line, issue.column] })),
    );
  }
  return {
    requests: preview.rows.flatMap((row) => (row.isValid && row.request !== null ? [row.request] : [])),
    skippedLines: preview.rows.filter((row) => !row.isValid).map((row) => row.line),
  };
}
