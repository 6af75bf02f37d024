/**
 * Names what cannot balance when only the zero vector balances a reaction: the elements (or
 * charge) found in one species only, or else the rows whose removal would let it balance.
 */
import { integerNullSpace } from './null-space';
import type { SpeciesMatrix } from './species-matrix';

function inOneSpeciesOnly(row: readonly bigint[]): boolean {
  return row.filter((value) => value !== 0n).length === 1;
}

function isBlocking(matrix: SpeciesMatrix, skip: number, columns: number): boolean {
  const rest = matrix.rows.filter((_, index) => index !== skip);
  return integerNullSpace(rest, columns).some((vector) => vector.every((value) => value !== 0n));
}

/**
 * Labels (element symbols or `charge`) that keep the matrix from any balance. Empty when no
 * single row is to blame (several elements conflict together).
 * @example findUnbalanceable(buildSpeciesMatrix(parseEquation('NaCl -> Na+').terms)); // ["Cl", "charge"]
 */
export function findUnbalanceable(matrix: SpeciesMatrix, columns: number): string[] {
  const lonely = matrix.labels.filter((_, index) => inOneSpeciesOnly(matrix.rows[index]));
  if (lonely.length > 0) return lonely;
  return matrix.labels.filter((_, index) => isBlocking(matrix, index, columns));
}
