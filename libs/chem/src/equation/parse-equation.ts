/**
 * Equation text: terms joined by ` + `, sides by `->`, `=`, `<=>` (or →, ⇌, ↔).
 */
import { ChemError, type Span } from '../errors/chem-error';
import { parseFormulaIn } from '../formula/parse-formula';
import { isSpace, trimRange } from '../formula/scanner';
import { parseCoefficient } from './coefficient';
import type { Equation, EquationTerm, Side } from './equation';

const ARROWS = ['<=>', '<->', '->', '→', '⟶', '⇌', '⇄', '↔', '='] as const;

function findArrows(text: string): Span[] {
  const found: Span[] = [];
  for (let index = 0; index < text.length; index += 1) {
    const arrow = ARROWS.find((candidate) => text.startsWith(candidate, index));
    if (arrow === undefined) continue;
    found.push({ start: index, end: index + arrow.length });
    index += arrow.length - 1;
  }
  return found;
}

/** Term ranges of one side: a `+` preceded by white space (or opening the side) separates terms. */
function splitTerms(text: string, side: Span): Span[] {
  const ranges: Span[] = [];
  let start = side.start;
  for (let index = side.start; index < side.end; index += 1) {
    const isSeparator = text[index] === '+' && (index === side.start || isSpace(text[index - 1]));
    if (!isSeparator) continue;
    ranges.push({ start, end: index });
    start = index + 1;
  }
  ranges.push({ start, end: side.end });
  return ranges;
}

function parseTerm(text: string, range: Span, side: Side): EquationTerm {
  const span = trimRange(text, range);
  if (span.start === span.end) {
    throw new ChemError('EQUATION_EMPTY_TERM', "A '+' has no term on one side of it.", {
      start: range.start,
      end: Math.max(range.end, range.start),
    });
  }
  const { value, formulaStart } = parseCoefficient(text, span);
  const formula = parseFormulaIn(text, { start: formulaStart, end: span.end });
  return { formula, coefficient: value, side, span };
}

function parseSide(text: string, range: Span, side: Side): EquationTerm[] {
  const trimmed = trimRange(text, range);
  if (trimmed.start === trimmed.end) {
    throw new ChemError('EQUATION_EMPTY_SIDE', `The ${side}-hand side of the equation is empty.`, range, { side });
  }
  return splitTerms(text, range).map((termRange) => parseTerm(text, termRange, side));
}

/**
 * Parses a reaction equation. Spans of errors and terms are indices into `text`.
 *
 * @throws ChemError EQUATION_EMPTY, EQUATION_NO_ARROW, EQUATION_SEVERAL_ARROWS,
 *   EQUATION_EMPTY_SIDE, EQUATION_EMPTY_TERM, EQUATION_BAD_COEFFICIENT, and FORMULA_* codes.
 * @example
 * const equation = parseEquation('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
 * equation.terms[1].coefficient?.toString(); // "15/4"
 * equation.terms[3].side; // "right"
 */
export function parseEquation(text: string): Equation {
  if (trimRange(text, { start: 0, end: text.length }).start === text.length) {
    throw new ChemError('EQUATION_EMPTY', 'The equation is empty.', { start: 0, end: text.length });
  }
  const arrows = findArrows(text);
  if (arrows.length === 0) {
    throw new ChemError('EQUATION_NO_ARROW', "Separate the two sides with '->', '=' or '<=>'.", {
      start: 0,
      end: text.length,
    });
  }
  if (arrows.length > 1) {
    throw new ChemError('EQUATION_SEVERAL_ARROWS', 'An equation has exactly one arrow.', arrows[1]);
  }
  const [arrow] = arrows;
  const left = parseSide(text, { start: 0, end: arrow.start }, 'left');
  const right = parseSide(text, { start: arrow.end, end: text.length }, 'right');
  return { text, terms: [...left, ...right] };
}
