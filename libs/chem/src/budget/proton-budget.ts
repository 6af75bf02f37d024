/**
 * Proton budget: net H+ produced (+) or consumed (−) per mole of the reference species, per kg
 * of it, per tonne of rock that holds it at a given weight percent, and as kg CaCO3 equivalent
 * per tonne (2 mol H+ per mol CaCO3, the convention behind the 31.25 factor).
 * H+ and H3O+ count +1 each; OH- counts −1 (as −H+); H2O is neutral.
 */
import { findTermIndex } from '../balance/balance-options';
import { ChemError } from '../errors/chem-error';
import type { Equation, EquationTerm } from '../equation/equation';
import { caco3KgPerTonne, molarMassExact } from '../convert/molar-mass';
import type { Formula } from '../formula/formula';
import { speciesKey } from '../formula/species-key';
import { Rational } from '../rational/rational';

/** The proton budget of a reaction. */
export interface ProtonBudget {
  /** The reference species as written. */
  readonly reference: string;
  /** Net mol H+ produced per mol of the reference species (exact). */
  readonly perMole: Rational;
  /** mol H+ per kg of the reference species (`null` for the electron). */
  readonly perKg: number | null;
  /** mol H+ per tonne of rock holding `rockWeightPercent` wt% of the reference species. */
  readonly perTonneRock: number | null;
  /** kg CaCO3 equivalent per tonne of rock: + acid to neutralise, − neutralising capacity. */
  readonly caco3KgPerTonne: number | null;
}

/** Options of {@link protonBudget}. */
export interface ProtonBudgetOptions {
  /** The species budgets are normalised to; default the first left-hand species. */
  readonly reference?: string;
  /** Weight percent (0–100) of the reference species in the rock. */
  readonly rockWeightPercent?: number;
}

const PROTON_WEIGHTS: ReadonlyMap<string, number> = new Map([
  ['H1|1', 1],
  ['H3 O1|1', 1],
  ['H1 O1|-1', -1],
]);

function protonWeight(formula: Formula): number {
  return PROTON_WEIGHTS.get(speciesKey(formula)) ?? 0;
}

function coefficientOf(term: EquationTerm): Rational {
  return term.coefficient ?? Rational.ONE;
}

function referenceIndex(equation: Equation, reference: string | undefined): number {
  if (reference === undefined) return Math.max(0, equation.terms.findIndex((term) => term.side === 'left'));
  try {
    return findTermIndex(equation, reference);
  } catch (error) {
    if (error instanceof ChemError && error.code === 'BALANCE_UNKNOWN_SPECIES') {
      throw new ChemError('BUDGET_UNKNOWN_REFERENCE', error.message, error.span, error.details);
    }
    throw error;
  }
}

function checkPercent(percent: number | undefined): void {
  if (percent === undefined || (Number.isFinite(percent) && percent >= 0 && percent <= 100)) return;
  const text = String(percent);
  throw new ChemError('BUDGET_BAD_AMOUNT', 'A weight percent lies between 0 and 100.', { start: 0, end: text.length });
}

/**
 * The proton budget of an equation with coefficients (a missing coefficient counts 1).
 * @throws ChemError BUDGET_UNKNOWN_REFERENCE (span in `options.reference`), BUDGET_BAD_AMOUNT.
 * @example
 * const pyrite = parseEquation('FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+');
 * protonBudget(pyrite).perMole.toString(); // "4"  (Itasca eq. 3.1)
 * protonBudget(pyrite, { rockWeightPercent: 1 }).caco3KgPerTonne; // ≈ 16.69
 */
export function protonBudget(equation: Equation, options: ProtonBudgetOptions = {}): ProtonBudget {
  checkPercent(options.rockWeightPercent);
  const index = referenceIndex(equation, options.reference);
  const reference = equation.terms[index];
  let net = Rational.ZERO;
  for (const term of equation.terms) {
    const weight = protonWeight(term.formula);
    if (weight === 0) continue;
    const signed = term.side === 'right' ? coefficientOf(term) : coefficientOf(term).neg();
    net = net.add(signed.mul(Rational.of(weight)));
  }
  const perMole = net.div(coefficientOf(reference));
  const mass = molarMassExact(reference.formula);
  const perKg = mass.isZero() ? null : perMole.mul(Rational.of(1000)).div(mass).toNumber();
  const percent = options.rockWeightPercent;
  const perTonneRock = perKg === null || percent === undefined ? null : perKg * 10 * percent;
  return {
    reference: reference.formula.text,
    perMole,
    perKg,
    perTonneRock,
    caco3KgPerTonne: perTonneRock === null ? null : caco3KgPerTonne(perTonneRock),
  };
}
