/**
 * Every minimal set of columns that reproduces a target vector exactly: a depth-first walk over
 * column subsets in index order, carrying fraction-free Gauss–Jordan elimination on BigInt rows
 * from parent to child (one pivot step per node). A branch stops as soon as the new column is
 * dependent on the chosen ones (no superset can be independent) or the subset fits (every
 * superset would contain a smaller fitting set, so none is minimal).
 */
import { choosePivot } from '../balance/null-space';
import { toIntegerRow } from '../balance/species-matrix';
import { gcdBig, Rational } from '../rational/rational';

/** One minimal fitting subset: column indices (ascending) and their exact coefficients. */
export interface FittingSubset {
  readonly columns: readonly number[];
  readonly values: readonly Rational[];
}

interface Node {
  /** Rows of the augmented matrix [A | b], after the row operations of the chosen pivots. */
  readonly rows: readonly (readonly bigint[])[];
  /** Chosen columns; `chosen[i]` is the pivot column of row `i`. */
  readonly chosen: readonly number[];
}

/** Scales each rational row (matrix row and its target entry) to integers, as {@link toIntegerRow}. */
export function integerRows(matrix: readonly (readonly Rational[])[], target: readonly Rational[]): bigint[][] {
  return matrix.map((row, index) => toIntegerRow([...row, target[index]]));
}

/** Columns still relevant below a node: the chosen pivots, the columns after `column`, and b. */
function liveColumns(chosen: readonly number[], column: number, width: number): number[] {
  const live = [...chosen, column];
  for (let index = column + 1; index < width; index += 1) live.push(index);
  return live;
}

function pivotStep(node: Node, pivotIndex: number, column: number, width: number): Node {
  const rank = node.chosen.length;
  const rows = node.rows.map((row) => row.slice());
  [rows[rank], rows[pivotIndex]] = [rows[pivotIndex], rows[rank]];
  const pivotRow = rows[rank];
  const live = liveColumns(node.chosen, column, width);
  for (let index = 0; index < rows.length; index += 1) {
    const factor = rows[index][column];
    if (index === rank || factor === 0n) continue;
    const common = gcdBig(pivotRow[column], factor);
    const keep = pivotRow[column] / common;
    const take = factor / common;
    const row = rows[index];
    let content = 0n;
    for (const at of live) {
      row[at] = keep * row[at] - take * pivotRow[at];
      if (row[at] !== 0n) content = gcdBig(content, row[at]);
    }
    if (content > 1n) for (const at of live) row[at] /= content;
  }
  return { rows, chosen: [...node.chosen, column] };
}

function fits(node: Node, width: number): boolean {
  for (let index = node.chosen.length; index < node.rows.length; index += 1) if (node.rows[index][width - 1] !== 0n) return false;
  return true;
}

function solution(node: Node, width: number): Rational[] {
  return node.chosen.map((column, row) => Rational.of(node.rows[row][width - 1], node.rows[row][column]));
}

/**
 * Every minimal subset of the columns of `rows` (an integer augmented matrix [A | b], b last)
 * whose span holds b: its columns are independent and every coefficient is non-zero. Subsets
 * have at most `maxSize` columns (default: the number of rows).
 * Cost: one elimination step per independent, non-fitting subset visited.
 * @example minimalFittingSubsets([[1n, 0n, 1n, 2n], [0n, 1n, 1n, 2n]]).map((s) => s.columns); // [[0, 1], [2]]
 */
export function minimalFittingSubsets(rows: readonly (readonly bigint[])[], maxSize = rows.length): FittingSubset[] {
  const width = rows.length === 0 ? 0 : rows[0].length;
  const found: FittingSubset[] = [];
  const visit = (node: Node, start: number): void => {
    for (let column = start; column < width - 1; column += 1) {
      const pivotIndex = choosePivot(node.rows, node.chosen.length, column);
      if (pivotIndex < 0) continue;
      const child = pivotStep(node, pivotIndex, column, width);
      if (fits(child, width)) {
        const values = solution(child, width);
        if (values.every((value) => !value.isZero())) found.push(reorder(child.chosen, values));
      } else if (child.chosen.length < maxSize) {
        visit(child, column + 1);
      }
    }
  };
  visit({ rows, chosen: [] }, 0);
  return found;
}

function reorder(columns: readonly number[], values: readonly Rational[]): FittingSubset {
  const order = columns.map((column, index) => ({ column, value: values[index] })).sort((a, b) => a.column - b.column);
  return { columns: order.map((entry) => entry.column), values: order.map((entry) => entry.value) };
}
