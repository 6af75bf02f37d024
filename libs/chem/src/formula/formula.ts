/**
 * The parsed form of a chemical formula: the tree as written (for canonical text and rendering)
 * and its exact composition and charge (for arithmetic).
 */
import type { Span } from '../errors/chem-error';
import type { Rational } from '../rational/rational';

/** A phase tag written after a formula. */
export type Phase = 's' | 'aq' | 'g' | 'l';

/** The phase tags Tallus reads, in the order they are documented. */
export const PHASES: readonly Phase[] = ['s', 'aq', 'g', 'l'];

/** An element symbol with its subscript (`null` when none was written). */
export interface ElementNode {
  readonly kind: 'element';
  readonly symbol: string;
  readonly count: Rational | null;
  /** Where the symbol and its subscript stand in the caller's text. */
  readonly span: Span;
}

/**
 * A bracketed group. `members` has one entry for an ordinary group and several for a mixed site
 * with stated proportions, such as `(Mg0.9,Fe0.1)2`.
 */
export interface GroupNode {
  readonly kind: 'group';
  readonly bracket: '(' | '[';
  readonly members: readonly (readonly FormulaNode[])[];
  readonly count: Rational | null;
  readonly span: Span;
}

/** A node of the formula tree. */
export type FormulaNode = ElementNode | GroupNode;

/** The main body (count `null`) or one hydrate part such as `·2H2O` (count 2). */
export interface FormulaUnit {
  readonly count: Rational | null;
  readonly nodes: readonly FormulaNode[];
}

/** A parsed formula. Build one with `parseFormula`. */
export interface Formula {
  /** The text as the user wrote it, without surrounding spaces. */
  readonly text: string;
  /** Where the formula stands in the caller's text. */
  readonly span: Span;
  /** The main body followed by hydrate parts; empty for the electron. */
  readonly units: readonly FormulaUnit[];
  /** Exact number of atoms of each element, in order of first appearance. */
  readonly composition: ReadonlyMap<string, Rational>;
  /** Charge in elementary charges (−1 for the electron). */
  readonly charge: Rational;
  readonly phase: Phase | null;
  /** Whether this is the electron `e-`. */
  readonly isElectron: boolean;
}
