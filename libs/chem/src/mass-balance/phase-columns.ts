/**
 * What one mole of a candidate phase (or one extent of a phase reaction) adds to the water, in
 * each constrained quantity: elements, charge and operational valence ("electrons").
 */
import { ChemError, isChemError } from '../errors/chem-error';
import type { EquationTerm } from '../equation/equation';
import { parseEquation } from '../equation/parse-equation';
import type { Formula } from '../formula/formula';
import { parseFormula } from '../formula/parse-formula';
import { speciesKey } from '../formula/species-key';
import { Rational } from '../rational/rational';
import { operationalValence } from './operational-valence';

/** How a phase may move: `dissolve` (transfer ≥ 0), `precipitate` (≤ 0), `either`. */
export type PhaseRule = 'dissolve' | 'precipitate' | 'either';

/** A candidate phase: a formula (the mineral or gas dissolves as a whole) or a reaction. */
export interface PhaseInput {
  readonly name: string;
  /** Formula of a mineral or gas, e.g. `CaCO3`, `CO2(g)`, `O2`. */
  readonly formula?: string;
  /** A balanced reaction, e.g. `Ca^2+ + 2 NaX -> CaX2 + 2 Na+`; `X` is the exchange site. */
  readonly equation?: string;
  readonly rule?: PhaseRule;
}

/** A constraint: an element symbol, `charge` or `electrons`. */
export type Constraint = string;

function speciesKeys(texts: readonly string[]): ReadonlySet<string> {
  return new Set(texts.map((text) => speciesKey(parseFormula(text))));
}

const NEUTRAL_SOLUTES = speciesKeys(['H4SiO4', 'H2CO3', 'H2S', 'H3BO3', 'NH3']);
const SOLVENT = speciesKeys(['H+', 'OH-', 'H3O+', 'H2O']);

/**
 * Whether a species is the solvent or its ions (H2O, H+, OH-, H3O+), which no analysis lists.
 * @example isSolvent(parseFormula('H+')); // true
 */
export function isSolvent(formula: Formula): boolean {
  return SOLVENT.has(speciesKey(formula));
}

/**
 * Whether a term of a phase reaction is in solution (part of the water): charged, tagged `(aq)`
 * or a known neutral solute (H4SiO4, H2CO3, H2S, H3BO3, NH3); never the solvent or the electron.
 * @example isDissolved(parseFormula('Na+')); // true
 */
export function isDissolved(formula: Formula): boolean {
  if (formula.isElectron) return false;
  const key = speciesKey(formula);
  if (SOLVENT.has(key)) return false;
  if (!formula.charge.isZero() || formula.phase === 'aq') return true;
  return NEUTRAL_SOLUTES.has(key);
}

/** The exchange site `X` (not an element) is read as the placeholder element Xe, absent from waters. */
export function withExchangeSite(text: string): string {
  return text.replace(/X(?![a-z])/g, 'Xe');
}

function amountOf(formula: Formula, constraint: Constraint): Rational {
  if (constraint === 'charge') return formula.charge;
  if (constraint === 'electrons') return operationalValence(formula);
  return formula.composition.get(constraint) ?? Rational.ZERO;
}

function termSign(term: EquationTerm): Rational {
  const coefficient = term.coefficient ?? Rational.ONE;
  return term.side === 'right' ? coefficient : coefficient.neg();
}

function checkBalanced(terms: readonly EquationTerm[], name: string, field: string, text: string): void {
  const totals = new Map<string, Rational>();
  for (const term of terms) {
    const sign = termSign(term);
    for (const [symbol, count] of term.formula.composition) totals.set(symbol, (totals.get(symbol) ?? Rational.ZERO).add(sign.mul(count)));
    totals.set('charge', (totals.get('charge') ?? Rational.ZERO).add(sign.mul(term.formula.charge)));
  }
  const off = [...totals].filter(([, value]) => !value.isZero()).map(([label]) => label);
  if (off.length > 0) {
    throw new ChemError('MASS_BALANCE_BAD_PHASE', `The reaction of phase "${name}" does not balance in ${off.join(', ')}.`, { start: 0, end: text.length }, {
      field,
      off,
    });
  }
}

function equationColumn(phase: PhaseInput, constraints: readonly Constraint[], field: string): Rational[] {
  const text = phase.equation ?? '';
  const terms = parseEquation(withExchangeSite(text)).terms;
  checkBalanced(terms, phase.name, field, text);
  const dissolved = terms.filter((term) => isDissolved(term.formula));
  return constraints.map((constraint) =>
    dissolved.reduce((sum, term) => sum.add(termSign(term).mul(amountOf(term.formula, constraint))), Rational.ZERO),
  );
}

function formulaColumn(phase: PhaseInput, constraints: readonly Constraint[]): Rational[] {
  const formula = parseFormula(phase.formula ?? '');
  return constraints.map((constraint) => amountOf(formula, constraint));
}

/**
 * The column of one phase: what a transfer of 1 adds to the water, per constraint.
 * A formula adds its whole composition, its charge and its operational valence (O2: O 2,
 * electrons +4). A reaction adds the net of its dissolved terms (charged, `(aq)`-tagged or known
 * neutral solutes such as H4SiO4), leaving out H+, OH- and H2O, which no analysis lists.
 * @param field the field path used in error details, e.g. `phases.2`
 * @throws ChemError MASS_BALANCE_BAD_PHASE (neither or both of formula and equation; an
 *   unbalanced reaction), FORMULA_*, EQUATION_*, OXIDATION_UNDETERMINED (with `electrons`);
 *   every error carries `details.field`
 * @example phaseColumn({ name: 'calcite', formula: 'CaCO3' }, ['Ca', 'C', 'charge'], 'phases.0').map(String);
 * // ["1", "1", "0"]
 */
export function phaseColumn(phase: PhaseInput, constraints: readonly Constraint[], field: string): Rational[] {
  const hasFormula = typeof phase.formula === 'string';
  const hasEquation = typeof phase.equation === 'string';
  if (hasFormula === hasEquation) {
    const name = String(phase.name ?? '');
    throw new ChemError('MASS_BALANCE_BAD_PHASE', `Phase "${name}" needs either a formula or an equation.`, { start: 0, end: name.length }, { field });
  }
  try {
    return hasFormula ? formulaColumn(phase, constraints) : equationColumn(phase, constraints, field);
  } catch (error) {
    if (isChemError(error) && error.details.field === undefined) {
      const where = hasFormula ? `${field}.formula` : `${field}.equation`;
      throw new ChemError(error.code, error.message, error.span, { ...error.details, field: where });
    }
    throw error;
  }
}
