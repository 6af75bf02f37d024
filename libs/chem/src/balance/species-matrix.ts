/**
 * The balance matrix: one row per element (in order of first appearance) and one for charge,
 * one column per term; left-hand terms count positive, right-hand terms negative, so that a
 * balanced reaction is a vector `x` with `matrix · x = 0`. Rows are scaled to whole numbers
 * (which leaves the null space unchanged) so that decimal subscripts stay exact.
 */
import type { Formula } from '../formula/formula';
import { lcmBig, Rational } from '../rational/rational';
import type { Side } from '../equation/equation';

/** The label of the charge row. */
export const CHARGE_ROW = 'charge';

/** What the matrix needs of a term. */
export interface MatrixTerm {
  readonly formula: Formula;
  readonly side: Side;
}

/** Integer rows and their labels (element symbols and `charge`). */
export interface SpeciesMatrix {
  readonly labels: readonly string[];
  readonly rows: readonly (readonly bigint[])[];
  /** The same rows, unscaled and exact, for residuals. */
  readonly exactRows: readonly (readonly Rational[])[];
}

function exactRow(terms: readonly MatrixTerm[], amountOf: (formula: Formula) => Rational): Rational[] {
  return terms.map((term) => {
    const amount = amountOf(term.formula);
    return term.side === 'left' ? amount : amount.neg();
  });
}

/**
 * A rational row times the lcm of its denominators: whole numbers with the same null space.
 * @example toIntegerRow([Rational.of(1, 2), Rational.of(2, 3)]); // [3n, 4n]
 */
export function toIntegerRow(row: readonly Rational[]): bigint[] {
  let scale = 1n;
  for (const value of row) scale = lcmBig(scale, value.den);
  return row.map((value) => (value.num * scale) / value.den);
}

/**
 * Builds the signed element-and-charge matrix of the terms.
 * @example buildSpeciesMatrix(parseEquation('H2 + O2 -> H2O').terms).labels; // ["H", "O"]
 */
export function buildSpeciesMatrix(terms: readonly MatrixTerm[]): SpeciesMatrix {
  const labels: string[] = [];
  for (const term of terms) {
    for (const symbol of term.formula.composition.keys()) if (!labels.includes(symbol)) labels.push(symbol);
  }
  const exactRows = labels.map((symbol) =>
    exactRow(terms, (formula) => formula.composition.get(symbol) ?? Rational.ZERO),
  );
  if (terms.some((term) => !term.formula.charge.isZero())) {
    labels.push(CHARGE_ROW);
    exactRows.push(exactRow(terms, (formula) => formula.charge));
  }
  return { labels, rows: exactRows.map(toIntegerRow), exactRows };
}
