/**
 * How far the transfers of a model move when the analyses move within their uncertainty.
 *
 * A model's transfers are the least-squares solution x = (AᵀA)⁻¹Aᵀ·Δ on its own phases (equal to
 * the exact solution when the model fits exactly). Δ is linear in every reported concentration,
 * so each transfer is a linear function of the concentrations; over the box "each concentration
 * within ±u % of its value" its extremes sit at vertices and equal x ± Σ |∂x/∂c|·u·c. The ranges
 * are therefore exact for the linearised problem (floats), with no vertex enumeration.
 */
import type { Rational } from '../rational/rational';

/** Sensitivity inputs: per water, the coefficient of each solute in each constraint row. */
export interface RangeInputs {
  /** Constraint rows × model columns. */
  readonly matrix: readonly (readonly number[])[];
  /** Per water (initial, final): amounts by solute key and coefficients row × solute key. */
  readonly waters: readonly {
    readonly sign: number;
    readonly amounts: ReadonlyMap<string, Rational>;
    readonly coefficients: readonly ReadonlyMap<string, number>[];
  }[];
  /** Relative uncertainty (percent) by solute key. */
  readonly uncertainty: Readonly<Record<string, number>>;
}

function invert(m: number[][]): number[][] {
  const size = m.length;
  const rows = m.map((row, index) => [...row, ...Array.from({ length: size }, (_, at) => (at === index ? 1 : 0))]);
  for (let column = 0; column < size; column += 1) {
    let pivot = column;
    for (let index = column + 1; index < size; index += 1) if (Math.abs(rows[index][column]) > Math.abs(rows[pivot][column])) pivot = index;
    [rows[column], rows[pivot]] = [rows[pivot], rows[column]];
    const lead = rows[column][column];
    rows[column] = rows[column].map((value) => value / lead);
    for (let index = 0; index < size; index += 1) {
      const factor = rows[index][column];
      if (index !== column && factor !== 0) rows[index] = rows[index].map((value, at) => value - factor * rows[column][at]);
    }
  }
  return rows.map((row) => row.slice(size));
}

/** P = (AᵀA)⁻¹Aᵀ, columns × rows. */
function pseudoInverse(matrix: readonly (readonly number[])[]): number[][] {
  const columns = matrix[0]?.length ?? 0;
  const normal = Array.from({ length: columns }, (_, a) => Array.from({ length: columns }, (_, b) => matrix.reduce((sum, row) => sum + row[a] * row[b], 0)));
  const inverse = invert(normal);
  return inverse.map((row) => matrix.map((_, r) => row.reduce((sum, value, b) => sum + value * matrix[r][b], 0)));
}

/**
 * Half-width of each transfer's range over the uncertainty box (same order as the columns).
 * @example transferHalfWidths({ matrix: [[1]], waters: [...], uncertainty: { Ca: 5 } }); // [0.05 × ...]
 */
export function transferHalfWidths(inputs: RangeInputs): number[] {
  const p = pseudoInverse(inputs.matrix);
  return p.map((row) => {
    let width = 0;
    for (const water of inputs.waters) {
      for (const [key, amount] of water.amounts) {
        const percent = inputs.uncertainty[key] ?? 0;
        if (percent === 0) continue;
        const slope = row.reduce((sum, value, r) => sum + value * (water.coefficients[r].get(key) ?? 0), 0);
        width += Math.abs(slope * water.sign) * amount.toNumber() * (percent / 100);
      }
    }
    return width;
  });
}
