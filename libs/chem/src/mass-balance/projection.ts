/**
 * Exact least squares on small rational systems: the orthogonal projection of a target onto the
 * span of a set of columns, and the least-squares coefficients on independent columns.
 */
import { reduceRows } from '../balance/null-space';
import { Rational } from '../rational/rational';
import { integerRows } from './minimal-subsets';

/** Solves the square system `m · x = v` exactly (m invertible) by Gauss–Jordan on rationals. */
function solveSquare(m: Rational[][], v: Rational[]): Rational[] {
  const size = v.length;
  const rows = m.map((row, index) => [...row, v[index]]);
  for (let column = 0; column < size; column += 1) {
    const pivot = rows.findIndex((row, index) => index >= column && !row[column].isZero());
    if (pivot < 0) throw new Error('singular normal equations');
    [rows[column], rows[pivot]] = [rows[pivot], rows[column]];
    const lead = rows[column][column];
    rows[column] = rows[column].map((value) => value.div(lead));
    for (let index = 0; index < size; index += 1) {
      const factor = rows[index][column];
      if (index !== column && !factor.isZero()) rows[index] = rows[index].map((value, at) => value.sub(factor.mul(rows[column][at])));
    }
  }
  return rows.map((row) => row[size]);
}

function dot(a: readonly Rational[], b: readonly Rational[]): Rational {
  return a.reduce((sum, value, index) => sum.add(value.mul(b[index])), Rational.ZERO);
}

/**
 * Least-squares coefficients of `target` on the given independent columns of `matrix`
 * (rows × columns): the exact solution of the normal equations AᵀA x = Aᵀb.
 * @example leastSquares([[r(1)], [r(1)]], [r(1), r(2)], [0]).map(String); // ["3/2"]
 */
export function leastSquares(matrix: readonly (readonly Rational[])[], target: readonly Rational[], columns: readonly number[]): Rational[] {
  const vectors = columns.map((column) => matrix.map((row) => row[column]));
  const normal = vectors.map((a) => vectors.map((b) => dot(a, b)));
  return solveSquare(normal, vectors.map((a) => dot(a, target)));
}

/**
 * The independent columns of `matrix` that span all of its columns (pivot columns, in order).
 * @example spanningColumns([[r(1), r(2), r(0)], [r(0), r(0), r(1)]]); // [0, 2]
 */
export function spanningColumns(matrix: readonly (readonly Rational[])[]): number[] {
  const width = matrix[0]?.length ?? 0;
  const rows = integerRows(matrix, matrix.map(() => Rational.ZERO)).map((row) => row.slice(0, width));
  return [...reduceRows(rows, width).pivots];
}

/**
 * The orthogonal projection of `target` onto the column span of `matrix`, exactly.
 * @example projectOnto([[r(1)], [r(1)]], [r(1), r(2)]).map(String); // ["3/2", "3/2"]
 */
export function projectOnto(matrix: readonly (readonly Rational[])[], target: readonly Rational[]): Rational[] {
  const columns = spanningColumns(matrix);
  if (columns.length === 0) return target.map(() => Rational.ZERO);
  const x = leastSquares(matrix, target, columns);
  return matrix.map((row) => columns.reduce((sum, column, index) => sum.add(row[column].mul(x[index])), Rational.ZERO));
}
