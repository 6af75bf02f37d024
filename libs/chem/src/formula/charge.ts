/**
 * Charge written after a formula: `^2+`, `^3-`, `^+`, `^+2`; Unicode superscripts `²⁺`, `⁻`;
 * a trailing `+` or `-` for ±1 (repeated signs such as `+++` count, and `+2` reads as 2+).
 */
import { Rational } from '../rational/rational';
import { isDigit, peek, scanError, signOf, superscriptDigit, type Scanner } from './scanner';

/** How the charge was written; `trailing` (bare `+`/`-`) is the one that can be ambiguous. */
export type ChargeForm = 'caret' | 'superscript' | 'trailing';

/** A charge read from the text. */
export interface ParsedCharge {
  readonly value: Rational;
  readonly form: ChargeForm;
  readonly start: number;
}

function readRun(scanner: Scanner, digitOf: (char: string) => string | null): string {
  let digits = '';
  while (digitOf(peek(scanner)) !== null) {
    digits += digitOf(peek(scanner));
    scanner.pos += 1;
  }
  return digits;
}

function asciiDigit(char: string): string | null {
  return isDigit(char) ? char : null;
}

function finish(scanner: Scanner, start: number, sign: number, digits: string, form: ChargeForm): ParsedCharge {
  const magnitude = digits === '' ? 1 : Number(digits);
  if (sign === 0 || magnitude === 0 || digits.length > 3) {
    throw scanError(scanner, 'FORMULA_BAD_CHARGE', 'Write a charge as ^2+, ^-, ²⁺ or a trailing + or -.', {
      start,
      end: scanner.pos,
    });
  }
  return { value: Rational.of(sign * magnitude), form, start };
}

function readSign(scanner: Scanner): number {
  const sign = signOf(peek(scanner));
  if (sign !== 0) scanner.pos += 1;
  return sign;
}

function parseCaret(scanner: Scanner, start: number): ParsedCharge {
  scanner.pos += 1;
  let digits = readRun(scanner, asciiDigit);
  const sign = readSign(scanner);
  if (digits === '') digits = readRun(scanner, asciiDigit);
  return finish(scanner, start, sign, digits, 'caret');
}

function parseSuperscript(scanner: Scanner, start: number): ParsedCharge {
  let digits = readRun(scanner, superscriptDigit);
  const sign = readSign(scanner);
  if (digits === '') digits = readRun(scanner, superscriptDigit);
  return finish(scanner, start, sign, digits, 'superscript');
}

function parseTrailing(scanner: Scanner, start: number): ParsedCharge {
  const sign = readSign(scanner);
  let count = 1;
  while (signOf(peek(scanner)) === sign && peek(scanner) !== '⁺' && peek(scanner) !== '⁻') {
    scanner.pos += 1;
    count += 1;
  }
  const digits = count === 1 ? readRun(scanner, asciiDigit) : String(count);
  return finish(scanner, start, sign, digits, 'trailing');
}

/**
 * Reads a charge at the cursor, or returns `null` when none is written.
 * @throws ChemError FORMULA_BAD_CHARGE for `^` without a sign or a zero charge.
 */
export function parseCharge(scanner: Scanner): ParsedCharge | null {
  const start = scanner.pos;
  const char = peek(scanner);
  if (char === '^') return parseCaret(scanner, start);
  if (superscriptDigit(char) !== null || char === '⁺' || char === '⁻') return parseSuperscript(scanner, start);
  if (signOf(char) !== 0) return parseTrailing(scanner, start);
  return null;
}
