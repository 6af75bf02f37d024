/**
 * The parsed form of a reaction equation.
 */
import type { Span } from '../errors/chem-error';
import type { Formula } from '../formula/formula';
import type { Rational } from '../rational/rational';

/** Which side of the arrow a term stands on. */
export type Side = 'left' | 'right';

/** One term: an optional coefficient and a formula. */
export interface EquationTerm {
  readonly formula: Formula;
  /** The coefficient as written, or `null` when none was written. */
  readonly coefficient: Rational | null;
  readonly side: Side;
  /** Where the whole term (coefficient and formula) stands in the equation text. */
  readonly span: Span;
}

/** A parsed equation. Build one with `parseEquation`. */
export interface Equation {
  readonly text: string;
  readonly terms: readonly EquationTerm[];
}
