/**
 * Balances with some coefficients fixed ("pinned"). The pins become rows `d·x_p − n·t = 0` of a
 * system with one extra unknown `t`; its null space vectors with `t ≠ 0`, scaled to `t = 1`,
 * are the balances that honour the pins.
 */
import { gcdBig, Rational } from '../rational/rational';
import { integerNullSpace } from './null-space';

/** The balances that honour the pins. */
export interface PinnedSolution {
  /** Dimension of the solution space counting `t`: 1 means exactly one balance. */
  readonly freedom: number;
  /** One balance honouring the pins, or `null` when the pins cannot be met. */
  readonly particular: readonly Rational[] | null;
  /** Directions that may be added to `particular` without breaking the balance or the pins. */
  readonly directions: readonly (readonly bigint[])[];
}

function primitive(vector: bigint[]): bigint[] {
  let content = 0n;
  for (const value of vector) if (value !== 0n) content = gcdBig(content, value);
  return content > 1n ? vector.map((value) => value / content) : vector;
}

function pinRows(columns: number, pins: ReadonlyMap<number, Rational>): bigint[][] {
  return [...pins].map(([column, value]) => {
    const row = new Array<bigint>(columns + 1).fill(0n);
    row[column] = value.den;
    row[columns] = -value.num;
    return row;
  });
}

/**
 * Solves `rows · x = 0` with `x[p] = pins.get(p)` for every pinned column `p`.
 * @example
 * // H2 + O2 -> H2O with H2 pinned to 1: particular = [1, 1/2, 1]
 * solvePinned([[2n, 0n, -2n], [0n, 2n, -1n]], 3, new Map([[0, Rational.ONE]])).particular;
 */
export function solvePinned(
  rows: readonly (readonly bigint[])[],
  columns: number,
  pins: ReadonlyMap<number, Rational>,
): PinnedSolution {
  const augmented = [...rows.map((row) => [...row, 0n]), ...pinRows(columns, pins)];
  const basis = integerNullSpace(augmented, columns + 1);
  const anchor = basis.find((vector) => vector[columns] !== 0n);
  if (anchor === undefined) {
    return { freedom: basis.length, particular: null, directions: basis.map((vector) => vector.slice(0, columns)) };
  }
  const scale = anchor[columns];
  const particular = anchor.slice(0, columns).map((value) => Rational.of(value, scale));
  const directions = basis
    .filter((vector) => vector !== anchor)
    .map((vector) => primitive(vector.slice(0, columns).map((value, index) => value * scale - anchor[index] * vector[columns])));
  return { freedom: basis.length, particular, directions };
}
