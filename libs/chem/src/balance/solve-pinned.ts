/**
 * Balances with some coefficients fixed ("pinned"). The pinned columns move to the right-hand side
 * as one extra column with unknown `t`; null space vectors with `t ≠ 0`, scaled to `t = 1`, are the
 * balances that honour the pins, and those with `t = 0` are the directions left free.
 */
import { lcmBig, Rational } from '../rational/rational';
import { divideByContent, integerNullSpace } from './null-space';

/** The balances that honour the pins. */
export interface PinnedSolution {
  /** Dimension of the solution space counting `t`: 1 means exactly one balance. */
  readonly freedom: number;
  /** One balance honouring the pins, or `null` when the pins cannot be met. */
  readonly particular: readonly Rational[] | null;
  /** Directions that may be added to `particular` without breaking the balance or the pins. */
  readonly directions: readonly (readonly bigint[])[];
}

/**
 * Moves the pinned columns to the right-hand side: `A_free · y + b · t = 0`, where `b` is
 * `Σ A_p · pin_p` scaled to integers by the common denominator `scale` of the pins. Solving the
 * small system of the free columns keeps the integers short, which matters for large systems.
 */
function reduceToFreeColumns(rows: readonly (readonly bigint[])[], free: readonly number[], pins: ReadonlyMap<number, Rational>) {
  let scale = 1n;
  for (const value of pins.values()) scale = lcmBig(scale, value.den);
  const reduced = rows.map((row) => {
    let pinned = 0n;
    for (const [column, value] of pins) pinned += row[column] * value.num * (scale / value.den);
    return [...free.map((column) => row[column]), pinned];
  });
  return { reduced, scale };
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
  const free = Array.from({ length: columns }, (_, column) => column).filter((column) => !pins.has(column));
  const { reduced, scale } = reduceToFreeColumns(rows, free, pins);
  const basis = integerNullSpace(reduced, free.length + 1);
  const t = free.length;
  const expand = (values: readonly bigint[]): bigint[] => {
    const full = new Array<bigint>(columns).fill(0n);
    free.forEach((column, index) => (full[column] = values[index]));
    return full;
  };
  const anchor = basis.find((vector) => vector[t] !== 0n);
  if (anchor === undefined) {
    return { freedom: basis.length, particular: null, directions: basis.map((vector) => expand(vector.slice(0, t))) };
  }
  const particular = Array.from({ length: columns }, (_, column) => pins.get(column) ?? Rational.ZERO);
  free.forEach((column, index) => (particular[column] = Rational.of(anchor[index], anchor[t] * scale)));
  const directions = basis
    .filter((vector) => vector !== anchor)
    .map((vector) => divideByContent(expand(vector.slice(0, t).map((value, index) => value * anchor[t] - anchor[index] * vector[t]))));
  return { freedom: basis.length, particular, directions };
}
