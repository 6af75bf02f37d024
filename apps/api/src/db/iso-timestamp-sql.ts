/**
 * SQL that writes a `timestamptz` column as JSON answers carry dates: `Date.toISOString()`'s
 * form, in UTC with milliseconds (the stored values come from JavaScript dates, so nothing finer is lost).
 *
 * @param column a column reference, e.g. `r.updated_at`; never user input
 */
export function isoTimestampSql(column: string): string {
  return `to_char(${column} at time zone 'UTC', 'YYYY-MM-DD"T"HH24:MI:SS.MS"Z"')`;
}
