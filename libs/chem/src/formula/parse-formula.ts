/**
 * Entry of the formula parser: body, hydrate parts, charge and phase tag, or the electron.
 */
import { ChemError, type Span } from '../errors/chem-error';
import { Rational } from '../rational/rational';
import { parseCharge, type ParsedCharge } from './charge';
import { compositionOf } from './composition';
import { parseCount } from './count';
import type { Formula, FormulaNode, FormulaUnit, Phase } from './formula';
import { parseNodes } from './parse-nodes';
import { parsePhase } from './phase';
import { createScanner, peek, scanError, skipSpaces, trimRange, unexpectedHere, type Scanner } from './scanner';

const HYDRATE_DOTS = new Set(['·', '•', '∙', '⋅', '*', '.']);
const ELECTRONS = new Set(['e-', 'e−', 'e⁻', 'e^-', 'e^1-']);

/**
 * Whether a bare trailing sign would be ambiguous: the body is one element with a subscript,
 * as in `Ca2+` or `Fe3+`, which could mean Ca2 with charge +1 or Ca with charge 2+.
 */
export function isChargeAmbiguous(units: readonly FormulaUnit[]): boolean {
  if (units.length !== 1 || units[0].nodes.length !== 1) return false;
  const node = units[0].nodes[0];
  return node.kind === 'element' && node.count !== null;
}

function parseBody(scanner: Scanner): FormulaNode[] {
  const nodes = parseNodes(scanner);
  if (nodes.length === 0) throw unexpectedHere(scanner, 'an element symbol or a bracket');
  return nodes;
}

function parseHydrates(scanner: Scanner): FormulaUnit[] {
  const units: FormulaUnit[] = [];
  while (HYDRATE_DOTS.has(peek(scanner))) {
    scanner.pos += 1;
    skipSpaces(scanner);
    const count = parseCount(scanner, 'multiplier');
    units.push({ count, nodes: parseBody(scanner) });
  }
  return units;
}

function parseTail(scanner: Scanner): { charge: ParsedCharge | null; phase: Phase | null } {
  let charge = parseCharge(scanner);
  const phase = parsePhase(scanner);
  if (charge === null && phase !== null) charge = parseCharge(scanner);
  return { charge, phase };
}

function checkAmbiguity(scanner: Scanner, units: readonly FormulaUnit[], charge: ParsedCharge | null): void {
  if (charge === null || charge.form !== 'trailing' || !charge.value.abs().equals(Rational.ONE)) return;
  if (!isChargeAmbiguous(units)) return;
  const node = units[0].nodes[0];
  throw scanError(
    scanner,
    'FORMULA_AMBIGUOUS_CHARGE',
    'A subscript before a bare sign is ambiguous: write Ca^2+ or Ca²⁺ for an ion of charge 2+, or Hg2^+ for a subscript.',
    { start: node.span.start, end: charge.start + 1 },
  );
}

function electronFormula(text: string, range: Span): Formula {
  return {
    text,
    span: range,
    units: [],
    composition: new Map(),
    charge: Rational.of(-1),
    phase: null,
    isElectron: true,
  };
}

/**
 * Parses the formula in `text[range.start, range.end)`; error spans are indices into `text`.
 * Used by the equation parser so that spans point into the equation.
 * @throws ChemError FORMULA_* codes.
 */
export function parseFormulaIn(text: string, range: Span): Formula {
  const span = trimRange(text, range);
  const written = text.slice(span.start, span.end);
  if (written === '') {
    throw new ChemError('FORMULA_EMPTY', 'The formula is empty.', { start: range.start, end: range.end });
  }
  if (ELECTRONS.has(written)) return electronFormula(written, span);
  const scanner = createScanner(text, span.start, span.end);
  const units: FormulaUnit[] = [{ count: null, nodes: parseBody(scanner) }, ...parseHydrates(scanner)];
  const { charge, phase } = parseTail(scanner);
  if (scanner.pos < scanner.end) throw unexpectedHere(scanner, 'a charge, a phase tag or the end of the formula');
  checkAmbiguity(scanner, units, charge);
  return {
    text: written,
    span,
    units,
    composition: compositionOf(units),
    charge: charge?.value ?? Rational.ZERO,
    phase,
    isElectron: false,
  };
}

/**
 * Parses a mineral, aqueous or gas formula, or the electron `e-`.
 *
 * @param text e.g. `Al2Si2O5(OH)4`, `Ca²⁺`, `SO4^2-`, `CaSO4·2H2O`, `CO2(g)`, `Na0.62Ca0.38Al1.38Si2.62O8`
 * @throws ChemError FORMULA_EMPTY, FORMULA_UNEXPECTED_TOKEN, FORMULA_UNKNOWN_ELEMENT,
 *   FORMULA_UNBALANCED_PAREN, FORMULA_MIXED_SITE, FORMULA_BAD_SUBSCRIPT, FORMULA_BAD_CHARGE,
 *   FORMULA_AMBIGUOUS_CHARGE, FORMULA_UNKNOWN_PHASE, with the span in `text`.
 * @example
 * const kaolinite = parseFormula('Al2Si2O5(OH)4');
 * kaolinite.composition.get('O')?.toString(); // "9"
 * parseFormula('Na0.62Ca0.38Al1.38Si2.62O8').composition.get('Na')?.toString(); // "31/50"
 */
export function parseFormula(text: string): Formula {
  return parseFormulaIn(text, { start: 0, end: text.length });
}
