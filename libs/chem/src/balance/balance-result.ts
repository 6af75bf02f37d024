/**
 * Result types of balancing. Rationals serialise as strings (`"15/4"`), so `JSON.stringify` of a
 * result is the JSON form the API and CLI send.
 */
import type { ChemIssue, Span } from '../errors/chem-error';
import type { ChemWarning } from '../errors/chem-warning';
import type { Side } from '../equation/equation';
import type { Rational } from '../rational/rational';

/**
 * `balanced`: exactly one balance (or the given coefficients balance); `unbalanced`: every
 * coefficient was given and they do not balance; `open`: several independent balances, pin some
 * coefficients; `impossible`: no balance; `invalid`: the text does not parse.
 */
export type BalanceStatus = 'balanced' | 'unbalanced' | 'open' | 'impossible' | 'invalid';

/** One term of a balance result, in the order the user wrote the terms. */
export interface BalancedTerm {
  /** The species as the user wrote it. */
  readonly formula: string;
  /** The side it stands on in the result (it may have moved). */
  readonly side: Side;
  /** Exact coefficient (≥ 0), or `null` when not determined (status `open`, `invalid`). */
  readonly coefficient: Rational | null;
  /** Where the term stands in the equation text. */
  readonly span: Span;
}

/** The outcome of {@link balanceEquation}. */
export interface BalanceResult {
  readonly status: BalanceStatus;
  /** Number of independent balances honouring the pins: 1 for `balanced`, 0 for `impossible`. */
  readonly freedom: number;
  readonly terms: readonly BalancedTerm[];
  /** Canonical text of the result (`null` for `invalid`); zero-coefficient species left out. */
  readonly equation: string | null;
  readonly warnings: readonly ChemWarning[];
  /** For `impossible`: the elements (or `charge`) that cannot balance. */
  readonly missing?: readonly string[];
  /** For `open`: one canonical equation per independent balance. */
  readonly balances?: readonly string[];
  /** For `invalid`: what does not parse, with its span. */
  readonly error?: ChemIssue;
}

/** Options of {@link balanceEquation}. */
export interface BalanceOptions {
  /** Scale the result to 1 mole of this species (a formula as written in the equation). */
  readonly normalizeTo?: string;
  /**
   * Fixed coefficients by formula, e.g. `{ 'FeS2': '1', 'O2': '15/4' }`. They override
   * coefficients written in the equation. Values: Rational, number, or text `"15/4"`, `"0.5"`.
   */
  readonly pins?: Readonly<Record<string, Rational | number | string>>;
}
