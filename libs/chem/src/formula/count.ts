/**
 * Subscripts and hydrate counts: integers or decimals, in ASCII or Unicode subscript digits.
 * A decimal is read as an exact fraction (0.35 = 7/20).
 */
import { Rational } from '../rational/rational';
import { peek, scanError, subscriptDigit, type Scanner } from './scanner';

/**
 * `subscript` follows an element or group; `multiplier` starts a hydrate part (`·0.5H2O`).
 * They differ in one case: `CaSO4.2H2O`. After a subscript, `.<digits>H2O` is read as a hydrate
 * dot followed by a count, because a decimal subscript immediately followed by water is far less
 * likely than the common ASCII hydrate notation; likewise `CaSO4.0.5H2O` is CaSO4 · 0.5 H2O.
 */
export type CountMode = 'subscript' | 'multiplier';

function readDigits(scanner: Scanner): string {
  let digits = '';
  for (;;) {
    const digit = subscriptDigit(peek(scanner));
    if (digit === null) return digits;
    digits += digit;
    scanner.pos += 1;
  }
}

function startsWithWater(scanner: Scanner, at: number): boolean {
  const rest = scanner.text.slice(at, Math.min(at + 3, scanner.end));
  return rest === 'H2O' || rest === 'H₂O';
}

function shouldReadFraction(scanner: Scanner, mode: CountMode): boolean {
  if (peek(scanner) !== '.' || subscriptDigit(peek(scanner, 1)) === null) return false;
  if (mode === 'multiplier') return true;
  let index = scanner.pos + 1;
  while (index < scanner.end && subscriptDigit(scanner.text[index]) !== null) index += 1;
  // `CaSO4.0.5H2O`: a second dot means the first one was the hydrate dot.
  return !startsWithWater(scanner, index) && scanner.text[index] !== '.';
}

/**
 * Reads a count at the cursor, or returns `null` (cursor unchanged) when none is written.
 * @throws ChemError FORMULA_BAD_SUBSCRIPT for a zero count.
 */
export function parseCount(scanner: Scanner, mode: CountMode): Rational | null {
  const start = scanner.pos;
  const whole = readDigits(scanner);
  if (whole === '') return null;
  let text = whole;
  if (shouldReadFraction(scanner, mode)) {
    scanner.pos += 1;
    text += `.${readDigits(scanner)}`;
  }
  const value = Rational.parse(text);
  if (value.isZero()) {
    throw scanError(scanner, 'FORMULA_BAD_SUBSCRIPT', 'A count of zero is not allowed; leave the part out.', {
      start,
      end: scanner.pos,
    });
  }
  return value;
}
