/**
 * Canonical equation text, which `parseEquation` reads back to the same terms.
 */
import { formatFormula } from '../formula/format-formula';
import type { Formula } from '../formula/formula';
import type { Rational } from '../rational/rational';
import type { Side } from './equation';

/** What {@link formatEquation} needs of a term. */
export interface FormattableTerm {
  readonly formula: Formula;
  readonly coefficient: Rational | null;
  readonly side: Side;
}

function formatTerm(term: FormattableTerm): string {
  const formula = formatFormula(term.formula);
  const coefficient = term.coefficient;
  if (coefficient === null || (coefficient.num === 1n && coefficient.den === 1n)) return formula;
  return `${coefficient.toString()} ${formula}`;
}

/**
 * `2 NaAlSi3O8 + 2 H+ + 9 H2O -> Al2Si2O5(OH)4 + 2 Na+ + 4 H4SiO4`: coefficients as exact
 * fractions (1 left out), canonical formulas, ` + ` between terms and ` -> ` between sides.
 * @example formatEquation(parseEquation('2H2 + O2 = 2 H₂O').terms); // "2 H2 + O2 -> 2 H2O"
 */
export function formatEquation(terms: readonly FormattableTerm[]): string {
  const side = (which: Side): string =>
    terms
      .filter((term) => term.side === which)
      .map(formatTerm)
      .join(' + ');
  return `${side('left')} -> ${side('right')}`;
}
