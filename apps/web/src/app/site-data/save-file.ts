/**
 * Hands a blob to the browser as a download.
 *
 * @param blob the file's content
 * @param name the file name the browser proposes, e.g. `water-analyses.csv`
 */
export function saveBlob(blob: Blob, name: string): void {
  const url = URL.createObjectURL(blob);
  const link = document.createElement('a');
  link.href = url;
  link.download = name;
  link.click();
  setTimeout(() => URL.revokeObjectURL(url), 1000);
}

/**
 * A file name from a user's title: letters, digits, dots and dashes only, lower case.
 *
 * @param title e.g. "Kestrel Flats — seep survey"
 * @param fallback used when nothing is left
 */
export function fileNameOf(title: string, fallback: string): string {
  return title.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '').toLowerCase() || fallback;
}

/**
 * CSV text of a table (RFC 4180 quoting), for client-side exports of computed tables.
 *
 * @param header column names, units in them
 * @param rows cells as text or numbers; null becomes empty
 */
export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | null)[])[]): string {
  const cell = (value: string | number | null): string => {
    const text = value === null ? '' : String(value);
    return /[",\n\r]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
  };
  return [header, ...rows].map((row) => row.map(cell).join(',')).join('\r\n') + '\r\n';
}
