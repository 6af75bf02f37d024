/**
 * Exact null space of an integer matrix: fraction-free Gauss–Jordan elimination on BigInt rows,
 * each row divided by the gcd of its entries after every step so that numbers stay small.
 * The result is exact; no floating point is involved.
 */
import { gcdBig, lcmBig } from '../rational/rational';

/** A matrix in reduced row-echelon form (pivots not scaled to 1) with its pivot columns. */
export interface RowEchelon {
  readonly rows: readonly (readonly bigint[])[];
  /** `pivots[i]` is the pivot column of row `i`; rows past `pivots.length` are zero. */
  readonly pivots: readonly number[];
}

function abs(value: bigint): bigint {
  return value < 0n ? -value : value;
}

/**
 * Divides a row in place by the gcd of its entries (its content), making it primitive; returns it.
 * @example divideByContent([4n, -6n, 0n]); // [2n, -3n, 0n]
 */
export function divideByContent(row: bigint[]): bigint[] {
  let content = 0n;
  for (const value of row) if (value !== 0n) content = gcdBig(content, value);
  if (content > 1n) for (let index = 0; index < row.length; index += 1) row[index] /= content;
  return row;
}

/**
 * The row at or after `from` whose entry in `column` is the smallest non-zero in absolute value
 * (the first of equals), or -1 when all are zero. Small pivots keep the integers short.
 */
export function choosePivot(rows: readonly (readonly bigint[])[], from: number, column: number): number {
  let best = -1;
  for (let index = from; index < rows.length; index += 1) {
    const value = rows[index][column];
    if (value !== 0n && (best < 0 || abs(value) < abs(rows[best][column]))) best = index;
  }
  return best;
}

function eliminate(target: bigint[], pivotRow: readonly bigint[], column: number): void {
  const factor = target[column];
  if (factor === 0n) return;
  const pivot = pivotRow[column];
  const common = gcdBig(pivot, factor);
  const keep = pivot / common;
  const take = factor / common;
  // Every entry is scaled by `keep`, also left of `column`, where the pivot row holds zeros.
  for (let index = 0; index < target.length; index += 1) {
    target[index] = keep * target[index] - take * pivotRow[index];
  }
  divideByContent(target);
}

/**
 * Reduces `matrix` (rows of equal length `columns`) to reduced row-echelon form.
 * Runs in O(rows² · columns) BigInt operations.
 * @example reduceRows([[1n, 1n], [2n, 2n]], 2).pivots; // [0]
 */
export function reduceRows(matrix: readonly (readonly bigint[])[], columns: number): RowEchelon {
  const rows = matrix.map((row) => row.slice());
  rows.forEach(divideByContent);
  const pivots: number[] = [];
  for (let column = 0; column < columns && pivots.length < rows.length; column += 1) {
    const rank = pivots.length;
    const best = choosePivot(rows, rank, column);
    if (best < 0) continue;
    [rows[rank], rows[best]] = [rows[best], rows[rank]];
    for (let index = 0; index < rows.length; index += 1) {
      if (index !== rank) eliminate(rows[index], rows[rank], column);
    }
    pivots.push(column);
  }
  return { rows, pivots };
}

function basisVector(echelon: RowEchelon, free: number, columns: number): bigint[] {
  let scale = 1n;
  echelon.pivots.forEach((pivot, row) => {
    if (echelon.rows[row][free] !== 0n) scale = lcmBig(scale, echelon.rows[row][pivot]);
  });
  const vector = new Array<bigint>(columns).fill(0n);
  vector[free] = scale;
  echelon.pivots.forEach((pivot, row) => {
    const entry = echelon.rows[row][free];
    if (entry !== 0n) vector[pivot] = (-entry * scale) / echelon.rows[row][pivot];
  });
  divideByContent(vector);
  if (vector[free] < 0n) for (let index = 0; index < columns; index += 1) vector[index] = -vector[index];
  return vector;
}

/**
 * A basis of `{x : matrix · x = 0}` as primitive integer vectors (gcd 1), one per free column,
 * each positive at its own free column. Empty when only the zero vector solves the system.
 *
 * @param matrix integer rows, each of length `columns`
 * @example integerNullSpace([[2n, 0n, -2n], [2n, -2n, -1n]], 3); // [[2n, 1n, 2n]] (2 H2 + O2 -> 2 H2O)
 */
export function integerNullSpace(matrix: readonly (readonly bigint[])[], columns: number): bigint[][] {
  const echelon = reduceRows(matrix, columns);
  const isPivot = new Array<boolean>(columns).fill(false);
  for (const pivot of echelon.pivots) isPivot[pivot] = true;
  const basis: bigint[][] = [];
  for (let column = 0; column < columns; column += 1) {
    if (!isPivot[column]) basis.push(basisVector(echelon, column, columns));
  }
  return basis;
}

/**
 * The rank of an integer matrix.
 * @example matrixRank([[1n, 2n], [2n, 4n]], 2); // 1
 */
export function matrixRank(matrix: readonly (readonly bigint[])[], columns: number): number {
  return reduceRows(matrix, columns).pivots.length;
}
