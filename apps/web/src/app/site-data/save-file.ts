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
