/**
 * Phase tags written after a formula: `(s)`, `(aq)`, `(g)`, `(l)`.
 */
import { PHASES, type Phase } from './formula';
import { isLower, peek, scanError, type Scanner } from './scanner';

function readTag(scanner: Scanner): string | null {
  if (peek(scanner) !== '(') return null;
  let index = 1;
  let tag = '';
  while (isLower(peek(scanner, index))) {
    tag += peek(scanner, index);
    index += 1;
  }
  return tag !== '' && peek(scanner, index) === ')' ? tag : null;
}

/** Whether the cursor stands on `(` followed by small letters and `)`: a phase tag, not a group. */
export function isPhaseTagAt(scanner: Scanner): boolean {
  return readTag(scanner) !== null;
}

/**
 * Reads a phase tag at the cursor, or returns `null` when there is none.
 * @throws ChemError FORMULA_UNKNOWN_PHASE for a tag other than s, aq, g, l.
 */
export function parsePhase(scanner: Scanner): Phase | null {
  const tag = readTag(scanner);
  if (tag === null) return null;
  const start = scanner.pos;
  scanner.pos += tag.length + 2;
  if (!(PHASES as readonly string[]).includes(tag)) {
    throw scanError(
      scanner,
      'FORMULA_UNKNOWN_PHASE',
      `Unknown phase tag (${tag}); use (s), (aq), (g) or (l).`,
      { start, end: scanner.pos },
      { tag },
    );
  }
  return tag as Phase;
}
