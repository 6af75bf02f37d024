/**
 * Turns the `normalizeTo` and `pins` options into term indices and exact values.
 * Spans of their errors are in the option's own text (the formula or the pin value).
 */
import { ChemError } from '../errors/chem-error';
import type { Equation } from '../equation/equation';
import { parseFormula } from '../formula/parse-formula';
import { isSameSpecies } from '../formula/species-key';
import { Rational } from '../rational/rational';
import type { BalanceOptions } from './balance-result';

/**
 * The index of the first term that is the species `formulaText`.
 * @throws ChemError BALANCE_UNKNOWN_SPECIES (span over `formulaText`), or FORMULA_* codes.
 */
export function findTermIndex(equation: Equation, formulaText: string): number {
  // The same text is the same species: most pins and targets repeat the equation's own spelling.
  const written = formulaText.trim();
  const exact = equation.terms.findIndex((term) => term.formula.text === written);
  if (exact >= 0) return exact;
  const formula = parseFormula(formulaText);
  const index = equation.terms.findIndex((term) => isSameSpecies(term.formula, formula));
  if (index < 0) {
    throw new ChemError(
      'BALANCE_UNKNOWN_SPECIES',
      `${formulaText.trim()} is not a species of this equation.`,
      { start: 0, end: formulaText.length },
      { species: formulaText },
    );
  }
  return index;
}

/**
 * Reads a pinned coefficient: a Rational, a finite number, or text such as `"15/4"` or `"0.5"`.
 * @throws ChemError BALANCE_BAD_PIN for a negative or unreadable value.
 */
export function readPinValue(value: Rational | number | string): Rational {
  const parsed = Rational.tryFrom(value);
  if (parsed === null || parsed.sign() < 0) {
    throw new ChemError('BALANCE_BAD_PIN', `A pinned coefficient must be a number ≥ 0, such as 2, 0.5 or 15/4.`, {
      start: 0,
      end: String(value).length,
    });
  }
  return parsed;
}

/**
 * Pins from the coefficients written in the equation, overridden by `options.pins`.
 * @throws ChemError BALANCE_UNKNOWN_SPECIES, BALANCE_BAD_PIN, FORMULA_* codes.
 */
export function resolvePins(equation: Equation, options: BalanceOptions): Map<number, Rational> {
  const pins = new Map<number, Rational>();
  equation.terms.forEach((term, index) => {
    if (term.coefficient !== null) pins.set(index, term.coefficient);
  });
  for (const [formula, value] of Object.entries(options.pins ?? {})) {
    pins.set(findTermIndex(equation, formula), readPinValue(value));
  }
  return pins;
}
