import { z } from 'zod';

/**
 * CSV uploads of site data (water analyses, rock samples): a preview that
 * reports every problem by row and column and saves nothing, and an import
 * that saves the valid rows in one transaction.
 *
 * Policy of `POST …/import`: by default a file with any problem saves nothing
 * (400 IMPORT_INVALID with every issue); with the multipart field
 * `skipInvalid=true` (sent after the user has seen the preview) the valid rows
 * are saved in one transaction and the invalid ones are left out and counted.
 */

/** Multipart field of the CSV file in previews and imports. */
export const CSV_FILE_FIELD = 'file';
/** Multipart field: `true` to save the valid rows and leave the invalid ones out. */
export const CSV_SKIP_INVALID_FIELD = 'skipInvalid';
/** Largest CSV accepted, in bytes. */
export const CSV_MAX_BYTES = 2 * 1024 * 1024;
/** Most data rows per file. */
export const CSV_MAX_ROWS = 5_000;

/** Codes of CSV problems (issue codes, not problem codes). */
export const CSV_ISSUE_CODES = [
  /** The file is not readable CSV (quotes, encoding) or has no header. */
  'CSV_PARSE',
  /** No file in the multipart field. */
  'CSV_NO_FILE',
  /** A header names a column the layout does not know. */
  'CSV_UNKNOWN_COLUMN',
  /** A solute column names an unknown solute. */
  'CSV_UNKNOWN_SOLUTE',
  /** A solute column's unit is unknown or does not fit the solute. */
  'CSV_BAD_UNIT',
  /** A cell is not a number (or `<limit` where allowed), or is out of range. */
  'CSV_BAD_VALUE',
  /** A required cell is empty (the sample name). */
  'CSV_MISSING_VALUE',
  /** The same sample name appears twice in the file. */
  'CSV_DUPLICATE_IN_FILE',
  /** The team already has a sample of that name. */
  'CSV_DUPLICATE_SAVED',
  /** The same column appears twice in the header. */
  'CSV_DUPLICATE_COLUMN',
  /** The file has more rows than {@link CSV_MAX_ROWS}. */
  'CSV_TOO_MANY_ROWS',
] as const;
export const csvIssueCodeSchema = z.enum(CSV_ISSUE_CODES);
export type CsvIssueCode = z.infer<typeof csvIssueCodeSchema>;

/**
 * One problem of a CSV file. `line` is the 1-based line of the file (the header
 * is line 1, the first data row line 2; 0 for the file as a whole); `column`
 * the header text of the cell (or null for the whole row or file).
 */
export const csvIssueSchema = z.object({
  code: csvIssueCodeSchema,
  message: z.string(),
  line: z.number().int().nonnegative(),
  column: z.string().nullable(),
});
export type CsvIssue = z.infer<typeof csvIssueSchema>;

/** How a header was read. */
export const csvColumnSchema = z.object({
  /** 0-based position in the header. */
  index: z.number().int().nonnegative(),
  header: z.string(),
  /** `field` (a fixed column), `value` (solute, mode or oxide column), `unknown` (an issue names it). */
  kind: z.enum(['field', 'value', 'unknown']),
  /** For `field`: the request field it fills, e.g. `temperatureC`; for `value`: the solute, mineral or oxide key. */
  key: z.string().nullable(),
  /** Unit of a solute column, e.g. `mg/L as CaCO3`. */
  unit: z.string().nullable(),
});
export type CsvColumn = z.infer<typeof csvColumnSchema>;

/** Builds the schema of a CSV preview whose valid rows hold `request`. */
export function csvPreviewSchemaOf<Request extends z.ZodType>(request: Request) {
  return z.object({
    columns: z.array(csvColumnSchema),
    rows: z.array(
      z.object({
        line: z.number().int().positive(),
        /** The sample name as read (may be empty). */
        name: z.string(),
        isValid: z.boolean(),
        /** The create request the row becomes (valid rows only). */
        request: request.nullable(),
        issues: z.array(csvIssueSchema),
      }),
    ),
    /** Every issue, file and header issues first, then by line. */
    issues: z.array(csvIssueSchema),
    validCount: z.number().int().nonnegative(),
    invalidCount: z.number().int().nonnegative(),
  });
}

/** Builds the schema of a CSV import's answer (201). */
export function csvImportResponseSchemaOf<Item extends z.ZodType>(item: Item) {
  return z.object({
    created: z.array(item),
    /** Lines left out (only with `skipInvalid=true`). */
    skippedLines: z.array(z.number().int().positive()),
  });
}
