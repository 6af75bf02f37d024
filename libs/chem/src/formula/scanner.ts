/**
 * Character-level reading shared by the formula and equation parsers: a cursor over the text,
 * and the classes of characters (ASCII and Unicode sub/superscript digits, signs).
 */
import { ChemError, type ChemErrorCode, type ChemErrorDetails, type Span } from '../errors/chem-error';

/** A cursor over one piece of text; `offset` moves error spans into the caller's string. */
export interface Scanner {
  readonly text: string;
  readonly offset: number;
  /** Index just past the last character this parse may read. */
  readonly end: number;
  pos: number;
}

/** A scanner over `text[start, end)`, reporting spans shifted by `offset`. */
export function createScanner(text: string, start: number, end: number, offset = 0): Scanner {
  return { text, offset, end, pos: start };
}

/** The character at the cursor (plus `ahead`), or `''` past the end. */
export function peek(scanner: Scanner, ahead = 0): string {
  const index = scanner.pos + ahead;
  return index < scanner.end ? scanner.text[index] : '';
}

/** Whether the cursor has reached the end. */
export function isAtEnd(scanner: Scanner): boolean {
  return scanner.pos >= scanner.end;
}

/** A ChemError spanning `[start, end)` of the scanned text. */
export function scanError(
  scanner: Scanner,
  code: ChemErrorCode,
  message: string,
  range: { start: number; end: number },
  details: ChemErrorDetails = {},
): ChemError {
  const span = { start: range.start + scanner.offset, end: range.end + scanner.offset };
  return new ChemError(code, message, span, details);
}

/** An unexpected-character error at the cursor, one code point wide. */
export function unexpectedHere(scanner: Scanner, expected: string): ChemError {
  const found = String.fromCodePoint(scanner.text.codePointAt(scanner.pos) ?? 0);
  const width = isAtEnd(scanner) ? 0 : found.length;
  const what = isAtEnd(scanner) ? 'end of text' : `'${found}'`;
  return scanError(
    scanner,
    'FORMULA_UNEXPECTED_TOKEN',
    `Unexpected ${what}; expected ${expected}.`,
    { start: scanner.pos, end: scanner.pos + width },
    { found: isAtEnd(scanner) ? '' : found },
  );
}

const SUBSCRIPT_DIGITS = '₀₁₂₃₄₅₆₇₈₉';
const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** The ASCII digit for `0-9` or a Unicode subscript digit, else `null`. */
export function subscriptDigit(char: string): string | null {
  if (char >= '0' && char <= '9' && char.length === 1) return char;
  const index = char === '' ? -1 : SUBSCRIPT_DIGITS.indexOf(char);
  return index >= 0 ? String(index) : null;
}

/** The ASCII digit for a Unicode superscript digit, else `null`. */
export function superscriptDigit(char: string): string | null {
  const index = char === '' ? -1 : SUPERSCRIPT_DIGITS.indexOf(char);
  return index >= 0 ? String(index) : null;
}

/** Whether `char` is an ASCII digit. */
export function isDigit(char: string): boolean {
  return char.length === 1 && char >= '0' && char <= '9';
}

/** Whether `char` is an ASCII capital letter. */
export function isUpper(char: string): boolean {
  return char.length === 1 && char >= 'A' && char <= 'Z';
}

/** Whether `char` is an ASCII small letter. */
export function isLower(char: string): boolean {
  return char.length === 1 && char >= 'a' && char <= 'z';
}

/** +1 for `+`/`⁺`, −1 for `-`/`−`/`⁻`, else 0. */
export function signOf(char: string): number {
  if (char === '+' || char === '⁺') return 1;
  if (char === '-' || char === '−' || char === '⁻') return -1;
  return 0;
}

/** Whether `char` is white space. */
export function isSpace(char: string): boolean {
  return char === ' ' || char === '\t' || char === '\n' || char === '\r' || char === '\u00a0';
}

/** Moves the cursor past white space. */
export function skipSpaces(scanner: Scanner): void {
  while (isSpace(peek(scanner))) scanner.pos += 1;
}

/** `range` of `text` without its leading and trailing white space (empty at its start if all space). */
export function trimRange(text: string, range: Span): Span {
  let { start, end } = range;
  while (start < end && isSpace(text[start])) start += 1;
  while (end > start && isSpace(text[end - 1])) end -= 1;
  return { start, end };
}
