import type { Span } from '@tallus/chem';

/** A text cut in three around a span, so the span can be underlined where the error is. */
export interface SpanSplit {
  before: string;
  /** The characters of the span; a single space when the span is empty (an error at the end of the text). */
  marked: string;
  after: string;
}

/**
 * Cuts a text around a span (0-based, end-exclusive, as libs/chem and the API report it).
 * A span past the end is clamped; an empty span marks one blank so the place still shows.
 *
 * @param text the text the span points into
 * @param span where the problem is
 * @example splitBySpan('CaX3', { start: 2, end: 3 }); // { before: 'Ca', marked: 'X', after: '3' }
 */
export function splitBySpan(text: string, span: Span): SpanSplit {
  const start = clamp(span.start, 0, text.length);
  const end = clamp(span.end, start, text.length);
  const marked = text.slice(start, end);
  return { before: text.slice(0, start), marked: marked === '' ? ' ' : marked, after: text.slice(end) };
}

function clamp(value: number, low: number, high: number): number {
  return Math.min(Math.max(Number.isFinite(value) ? Math.trunc(value) : low, low), high);
}
