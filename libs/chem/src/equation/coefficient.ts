/**
 * Coefficients in front of a term: integers, decimals, fractions (`15/4`) or a Unicode vulgar
 * fraction (`½`). Read exactly.
 */
import { ChemError, type Span } from '../errors/chem-error';
import { Rational } from '../rational/rational';

const VULGAR: Readonly<Record<string, readonly [number, number]>> = {
  '½': [1, 2], '⅓': [1, 3], '⅔': [2, 3], '¼': [1, 4], '¾': [3, 4], '⅕': [1, 5], '⅖': [2, 5],
  '⅗': [3, 5], '⅘': [4, 5], '⅙': [1, 6], '⅚': [5, 6], '⅛': [1, 8], '⅜': [3, 8], '⅝': [5, 8],
  '⅞': [7, 8],
};

const NUMBER_START = /^(\d+(?:\.\d+)?)(\/(\d*))?/;

/** A coefficient and the index where the formula starts. */
export interface ParsedCoefficient {
  readonly value: Rational | null;
  readonly formulaStart: number;
}

function badCoefficient(message: string, span: Span): ChemError {
  return new ChemError('EQUATION_BAD_COEFFICIENT', message, span);
}

function readNumber(text: string, range: Span): ParsedCoefficient | null {
  const match = NUMBER_START.exec(text.slice(range.start, range.end));
  if (!match) return null;
  const end = range.start + match[0].length;
  if (match[2] !== undefined && match[3] === '') {
    throw badCoefficient('A fraction needs a denominator, as in 15/4.', { start: range.start, end });
  }
  const value = Rational.tryParse(match[0]);
  if (value === null || value.isZero()) {
    throw badCoefficient('A coefficient must be a positive number; leave a species out rather than write 0.', {
      start: range.start,
      end,
    });
  }
  return { value, formulaStart: end };
}

/**
 * Reads the coefficient at the start of a trimmed term `text[range)`.
 * @throws ChemError EQUATION_BAD_COEFFICIENT for 0, `1/0`, `3/` or a negative coefficient.
 */
export function parseCoefficient(text: string, range: Span): ParsedCoefficient {
  const first = text[range.start];
  const vulgar = VULGAR[first];
  if (vulgar !== undefined) return { value: Rational.of(vulgar[0], vulgar[1]), formulaStart: range.start + 1 };
  if ((first === '-' || first === '−') && /\d/.test(text[range.start + 1] ?? '')) {
    throw badCoefficient('A negative coefficient is not allowed; write the species on the other side.', {
      start: range.start,
      end: range.start + 2,
    });
  }
  return readNumber(text, range) ?? { value: null, formulaStart: range.start };
}
