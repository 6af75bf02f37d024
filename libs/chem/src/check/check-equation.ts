/**
 * Checking a reaction with coefficients: element and charge residuals, the electron budget and
 * the proton budget. A term without a coefficient counts 1.
 */
import { CHARGE_ROW, buildSpeciesMatrix } from '../balance/species-matrix';
import { protonBudget, type ProtonBudget } from '../budget/proton-budget';
import { isChemError, type ChemError, type ChemIssue } from '../errors/chem-error';
import type { ChemWarning } from '../errors/chem-warning';
import type { Equation } from '../equation/equation';
import { parseEquation } from '../equation/parse-equation';
import { electronBudget, type ElectronBudget, type OxidationStateMap } from '../oxidation/electron-budget';
import { Rational } from '../rational/rational';

/** The outcome of {@link checkEquation}. */
export interface CheckResult {
  readonly status: 'balanced' | 'unbalanced' | 'invalid';
  /** Left minus right, per element and for `charge` (always present, `0` when balanced). */
  readonly residuals: ReadonlyMap<string, Rational>;
  /** `null` when an oxidation state cannot be decided (see `warnings`) or for `invalid`. */
  readonly electrons: ElectronBudget | null;
  readonly protonBudget: ProtonBudget | null;
  readonly warnings: readonly ChemWarning[];
  readonly error?: ChemIssue;
}

/** Options of {@link checkEquation}. */
export interface CheckOptions {
  /** Explicit oxidation states by formula, for species the rules cannot decide. */
  readonly oxidationStates?: OxidationStateMap;
  /** Reference species of the proton budget; default the first left-hand species. */
  readonly reference?: string;
  /** Weight percent of the reference species in the rock, for per-tonne figures. */
  readonly rockWeightPercent?: number;
}

function invalid(error: ChemError): CheckResult {
  return { status: 'invalid', residuals: new Map(), electrons: null, protonBudget: null, warnings: [], error: error.toIssue() };
}

function residualsOf(equation: Equation): Map<string, Rational> {
  const matrix = buildSpeciesMatrix(equation.terms);
  const values = equation.terms.map((term) => term.coefficient ?? Rational.ONE);
  const residuals = new Map<string, Rational>();
  matrix.labels.forEach((label, row) => {
    const sum = matrix.exactRows[row].reduce((total, entry, index) => total.add(entry.mul(values[index])), Rational.ZERO);
    residuals.set(label, sum);
  });
  if (!residuals.has(CHARGE_ROW)) residuals.set(CHARGE_ROW, Rational.ZERO);
  return residuals;
}

function tryElectrons(equation: Equation, options: CheckOptions, warnings: ChemWarning[]): ElectronBudget | null {
  try {
    const terms = equation.terms.map((term) => ({ ...term, coefficient: term.coefficient ?? Rational.ONE }));
    return electronBudget(terms, options.oxidationStates);
  } catch (error) {
    if (!isChemError(error)) throw error;
    warnings.push({ code: error.code, message: error.message, span: error.span });
    return null;
  }
}

/**
 * Checks a reaction as written. Never throws for bad text: the result then has status
 * `invalid` and an `error`. An unknown reference also gives `invalid`, with the span in the
 * option's text. A bad oxidation-state entry (a key that does not parse, a state that is not a
 * number) gives `electrons: null` and a warning, with the span in the entry's text.
 *
 * @example
 * const result = checkEquation('FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+');
 * result.status;                                   // "balanced"
 * result.electrons?.byElement.get('S')?.toString(); // "14"
 * result.protonBudget?.perMole.toString();          // "2"
 */
export function checkEquation(input: string | Equation, options: CheckOptions = {}): CheckResult {
  try {
    const equation = typeof input === 'string' ? parseEquation(input) : input;
    const residuals = residualsOf(equation);
    const isBalanced = [...residuals.values()].every((value) => value.isZero());
    const warnings: ChemWarning[] = [];
    const electrons = tryElectrons(equation, options, warnings);
    const budget = protonBudget(equation, { reference: options.reference, rockWeightPercent: options.rockWeightPercent });
    return { status: isBalanced ? 'balanced' : 'unbalanced', residuals, electrons, protonBudget: budget, warnings };
  } catch (error) {
    if (isChemError(error)) return invalid(error);
    throw error;
  }
}
