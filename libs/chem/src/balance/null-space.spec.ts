/**
 * The exact null space against an independent floating-point one: the SVD of ml-matrix.
 */
import fc from 'fast-check';
import { Matrix, SVD } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { integerNullSpace, matrixRank } from './null-space';

function floatNullity(rows: readonly (readonly bigint[])[], columns: number): { nullity: number; basis: Matrix } {
  const matrix = new Matrix(rows.map((row) => row.map(Number)));
  // ml-matrix's SVD wants at least as many rows as columns: pad with zero rows, which keeps the null space.
  const padded = new Matrix(Math.max(matrix.rows, columns), columns);
  padded.setSubMatrix(matrix, 0, 0);
  const svd = new SVD(padded, { autoTranspose: true });
  const tolerance = 1e-9 * Math.max(1, svd.diagonal[0] ?? 0);
  const small = svd.diagonal.map((value, index) => [value, index] as const).filter(([value]) => value <= tolerance);
  const basis = svd.rightSingularVectors.subMatrixColumn(small.map(([, index]) => index));
  return { nullity: small.length, basis };
}

function residualOutsideFloatNullSpace(vector: readonly bigint[], basis: Matrix): number {
  const v = Matrix.columnVector(vector.map(Number));
  const projection = basis.mmul(basis.transpose().mmul(v));
  return v.sub(projection).norm() / Math.max(1, v.norm());
}

const matrices = fc
  .tuple(fc.integer({ min: 1, max: 7 }), fc.integer({ min: 1, max: 9 }))
  .chain(([rows, columns]) =>
    fc.array(fc.array(fc.integer({ min: -6, max: 6 }), { minLength: columns, maxLength: columns }), {
      minLength: rows,
      maxLength: rows,
    }).map((entries) => ({ columns, rows: entries.map((row) => row.map(BigInt)) })),
  );

describe('integerNullSpace', () => {
  it.each([
    ['2 H2 + O2 -> 2 H2O', [[2n, 0n, -2n], [0n, 2n, -1n]], 3, [[2n, 1n, 2n]]],
    ['one row', [[1n, 1n]], 2, [[-1n, 1n]]],
    ['the identity', [[1n, 0n], [0n, 1n]], 2, []],
  ])('finds the null space of %s', (_name, rows, columns, expected) => {
    expect(integerNullSpace(rows, columns)).toEqual(expected);
  });

  it('has the dimension of the SVD null space, and its vectors lie in it, on random integer matrices', () => {
    fc.assert(
      fc.property(matrices, ({ rows, columns }) => {
        const exact = integerNullSpace(rows, columns);
        const float = floatNullity(rows, columns);
        expect(exact.length).toBe(float.nullity);
        expect(columns - matrixRank(rows, columns)).toBe(exact.length);
        for (const vector of exact) {
          expect(rows.every((row) => row.reduce((sum, value, index) => sum + value * vector[index], 0n) === 0n)).toBe(true);
          if (float.nullity > 0) expect(residualOutsideFloatNullSpace(vector, float.basis)).toBeLessThan(1e-8);
        }
      }),
      { numRuns: 300 },
    );
  });
});
