/**
 * Net reactions: exact multipliers that make named intermediates cancel in a sum of reactions.
 */
import { solvePinned } from '../balance/solve-pinned';
import { toIntegerRow } from '../balance/species-matrix';
import { isChemError, type ChemIssue } from '../errors/chem-error';
import type { ChemWarning } from '../errors/chem-warning';
import type { Equation, Side } from '../equation/equation';
import { formatEquation } from '../equation/format-equation';
import type { Formula } from '../formula/formula';
import { Rational } from '../rational/rational';
import { buildCombineProblem, type CombineProblem } from './combine-problem';

/** One reaction of a combination, with an optional fixed multiplier. */
export interface CombineReaction {
  readonly equation: string | Equation;
  readonly multiplier?: Rational | number | string;
}

/** Input of {@link combineReactions}. */
export interface CombineInput {
  readonly reactions: readonly CombineReaction[];
  /** Formulas of the species that must cancel (intermediates). */
  readonly cancel: readonly string[];
}

/** `combined`: one set of multipliers; `none`: no combination cancels them; `several`: more than one. */
export type CombineStatus = 'combined' | 'none' | 'several' | 'invalid';

/** One term of the net reaction. */
export interface CombinedTerm {
  readonly formula: string;
  readonly side: Side;
  readonly coefficient: Rational;
}

interface PlacedTerm {
  readonly formula: Formula;
  readonly side: Side;
  readonly coefficient: Rational;
}

/** The outcome of {@link combineReactions}. */
export interface CombineResult {
  readonly status: CombineStatus;
  /** Per reaction; `null` where not determined (`several`, `none`). Negative reverses a reaction. */
  readonly multipliers: readonly (Rational | null)[];
  /** Canonical text of the net reaction (`null` unless `combined`). */
  readonly equation: string | null;
  readonly terms: readonly CombinedTerm[];
  /** Number of independent combinations honouring the fixed multipliers. */
  readonly freedom: number;
  readonly warnings: readonly ChemWarning[];
  /** For `invalid`; `reaction` is the index of the reaction whose text is at fault, if any. */
  readonly error?: ChemIssue & { readonly reaction?: number; readonly cancel?: number };
}

function netTerms(problem: CombineProblem, multipliers: readonly Rational[]): PlacedTerm[] {
  const placed = problem.species.flatMap((formula, index): PlacedTerm[] => {
    const total = problem.net.reduce((sum, row, reaction) => sum.add(row[index].mul(multipliers[reaction])), Rational.ZERO);
    if (total.isZero()) return [];
    return [{ formula, side: total.sign() < 0 ? 'left' : 'right', coefficient: total.abs() }];
  });
  return [...placed.filter((term) => term.side === 'left'), ...placed.filter((term) => term.side === 'right')];
}

function result(status: CombineStatus, fields: Partial<CombineResult> & { freedom: number }, count: number): CombineResult {
  return { status, multipliers: new Array(count).fill(null), equation: null, terms: [], warnings: [], ...fields };
}

/**
 * Finds multipliers so that the `cancel` species vanish from the sum of the reactions. Without
 * fixed multipliers the first reaction's is 1. Never throws for bad text (status `invalid`).
 *
 * @example
 * const net = combineReactions({
 *   reactions: [
 *     { equation: 'FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+' },
 *     { equation: '4 Fe^2+ + O2 + 10 H2O -> 4 Fe(OH)3 + 8 H+' },
 *   ],
 *   cancel: ['Fe^2+'],
 * });
 * net.multipliers.map(String); // ["1", "1/4"]
 * net.equation; // "FeS2 + 15/4 O2 + 7/2 H2O -> 2 SO4^2- + 4 H+ + Fe(OH)3"
 */
export function combineReactions(input: CombineInput): CombineResult {
  const count = input.reactions.length;
  let problem: CombineProblem;
  try {
    problem = buildCombineProblem(input.reactions.map((reaction) => reaction.equation), input.cancel, input.reactions);
  } catch (error) {
    if (!isChemError(error)) throw error;
    const where = error.details;
    const reaction = typeof where.reaction === 'number' ? where.reaction : undefined;
    const cancel = typeof where.cancel === 'number' ? where.cancel : undefined;
    return result('invalid', { freedom: 0, error: { ...error.toIssue(), reaction, cancel } }, count);
  }
  const solution = solvePinned(problem.cancelRows.map(toIntegerRow), count, problem.pins);
  if (solution.particular === null) return result('none', { freedom: 0, warnings: problem.warnings }, count);
  if (solution.freedom > 1) {
    const fixed = solution.particular.map((value, index) =>
      solution.directions.every((direction) => direction[index] === 0n) ? value : null,
    );
    return result('several', { freedom: solution.freedom, multipliers: fixed, warnings: problem.warnings }, count);
  }
  const placed = netTerms(problem, solution.particular);
  const terms = placed.map((term) => ({ ...term, formula: term.formula.text }));
  const equation = formatEquation(placed);
  return result('combined', { freedom: 1, multipliers: solution.particular, equation, terms, warnings: problem.warnings }, count);
}
