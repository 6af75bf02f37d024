/**
 * Balancing: exact null space of the element-and-charge matrix, pins, scaling, and the status.
 */
import { isChemError, type ChemError } from '../errors/chem-error';
import type { ChemWarning } from '../errors/chem-warning';
import type { Equation } from '../equation/equation';
import { parseEquation } from '../equation/parse-equation';
import { Rational } from '../rational/rational';
import { findTermIndex, resolvePins } from './balance-options';
import type { BalanceOptions, BalanceResult } from './balance-result';
import { describeOpen, finishBalanced } from './balance-output';
import { findUnbalanceable } from './explain-impossible';
import { integerNullSpace } from './null-space';
import { solvePinned } from './solve-pinned';
import { buildSpeciesMatrix, type SpeciesMatrix } from './species-matrix';

interface Problem {
  readonly equation: Equation;
  readonly matrix: SpeciesMatrix;
  readonly pins: ReadonlyMap<number, Rational>;
  readonly normalize: number | null;
}

function invalid(error: ChemError): BalanceResult {
  return { status: 'invalid', freedom: 0, terms: [], equation: null, warnings: [], error: error.toIssue() };
}

/** Chooses the sign that keeps most species on the side where they were written. */
function orient(vector: readonly bigint[]): Rational[] {
  let agree = 0;
  vector.forEach((value) => {
    if (value !== 0n) agree += value > 0n ? 1 : -1;
  });
  const firstSign = vector.find((value) => value !== 0n) ?? 1n;
  const flip = agree < 0 || (agree === 0 && firstSign < 0n);
  return vector.map((value) => Rational.of(flip ? -value : value));
}

/** @param basis the null space of `problem.matrix.rows`, as the caller already computed it */
function impossible(problem: Problem, basis: readonly (readonly bigint[])[], warnings: ChemWarning[]): BalanceResult {
  const columns = problem.equation.terms.length;
  const isTrivial = basis.length === 0;
  const elementRows = problem.matrix.rows.slice(0, problem.matrix.labels.length);
  const matrix = { ...problem.matrix, rows: elementRows };
  return {
    status: 'impossible',
    freedom: 0,
    terms: problem.equation.terms.map((term) => ({
      formula: term.formula.text,
      side: term.side,
      coefficient: null,
      span: term.span,
    })),
    equation: null,
    warnings,
    missing: isTrivial ? findUnbalanceable(matrix, columns) : [],
  };
}

function checkGiven(problem: Problem): BalanceResult {
  const values = problem.equation.terms.map((_, index) => problem.pins.get(index) ?? Rational.ZERO);
  const residual = problem.matrix.exactRows.map((row) =>
    row.reduce((sum, entry, index) => sum.add(entry.mul(values[index])), Rational.ZERO),
  );
  const missing = problem.matrix.labels.filter((_, index) => !residual[index].isZero());
  const result = finishBalanced(problem.equation, values, null);
  if (missing.length === 0) return result;
  return { ...result, status: 'unbalanced', freedom: 0, missing };
}

function balanceFree(problem: Problem): BalanceResult {
  const columns = problem.equation.terms.length;
  const basis = integerNullSpace(problem.matrix.rows, columns);
  if (basis.length === 0) return impossible(problem, basis, []);
  if (basis.length > 1) return describeOpen(problem.equation, basis, basis.length, null);
  return finishBalanced(problem.equation, orient(basis[0]), problem.normalize);
}

function balancePinned(problem: Problem): BalanceResult {
  const columns = problem.equation.terms.length;
  const solution = solvePinned(problem.matrix.rows, columns, problem.pins);
  if (solution.particular === null) {
    const warning: ChemWarning = {
      code: 'BALANCE_PINS_CONFLICT',
      message: 'No balance honours the fixed coefficients; change or remove some of them.',
    };
    return impossible(problem, integerNullSpace(problem.matrix.rows, columns), [warning]);
  }
  if (solution.freedom === 1) return finishBalanced(problem.equation, solution.particular, problem.normalize);
  const basis = integerNullSpace(problem.matrix.rows, columns);
  return describeOpen(problem.equation, basis, solution.freedom, solution);
}

/**
 * A pin of zero leaves a species out without fixing the scale, so it becomes a row `x_p = 0`
 * of the matrix rather than a pin (a zero pin would let the zero vector pass for a balance).
 */
function withZeroPinsAsRows(problem: Problem): Problem {
  const zeros = [...problem.pins].filter(([, value]) => value.isZero()).map(([index]) => index);
  if (zeros.length === 0) return problem;
  const columns = problem.equation.terms.length;
  const rows = zeros.map((index) => Array.from({ length: columns }, (_, column) => (column === index ? 1n : 0n)));
  const pins = new Map([...problem.pins].filter(([, value]) => !value.isZero()));
  return { ...problem, pins, matrix: { ...problem.matrix, rows: [...problem.matrix.rows, ...rows] } };
}

/**
 * Balances a reaction in elements and charge with exact rational arithmetic. Coefficients
 * written in the equation are kept (pinned); the others are solved for. Never throws for bad
 * text: the result then has status `invalid` and an `error` with code and span.
 *
 * @param input equation text or a parsed equation
 * @param options `normalizeTo`: scale to 1 mol of this species; `pins`: fixed coefficients
 * @example
 * const result = balanceEquation('NaAlSi3O8 + H+ + H2O -> Al2Si2O5(OH)4 + Na+ + H4SiO4');
 * result.status;   // "balanced"
 * result.equation; // "2 NaAlSi3O8 + 2 H+ + 9 H2O -> Al2Si2O5(OH)4 + 2 Na+ + 4 H4SiO4"
 * balanceEquation('FeS2 + O2 + H2O -> Fe(OH)3 + SO4^2- + H+', { normalizeTo: 'FeS2' }).equation;
 * // "FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+"
 */
export function balanceEquation(input: string | Equation, options: BalanceOptions = {}): BalanceResult {
  let problem: Problem;
  try {
    const equation = typeof input === 'string' ? parseEquation(input) : input;
    const pins = resolvePins(equation, options);
    const normalize = options.normalizeTo === undefined ? null : findTermIndex(equation, options.normalizeTo);
    problem = { equation, matrix: buildSpeciesMatrix(equation.terms), pins, normalize };
  } catch (error) {
    if (isChemError(error)) return invalid(error);
    throw error;
  }
  if (problem.pins.size === problem.equation.terms.length) return checkGiven(problem);
  const zeroPinned = withZeroPinsAsRows(problem);
  if (zeroPinned.pins.size === 0) return balanceFree(zeroPinned);
  return balancePinned(zeroPinned);
}
