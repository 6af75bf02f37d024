/**
 * Builds balance results from solution vectors: sides, moved and unused species, scaling to
 * one mole of a species, canonical text, and the list of independent balances of an open system.
 */
import type { ChemWarning } from '../errors/chem-warning';
import type { Equation, EquationTerm, Side } from '../equation/equation';
import { formatEquation } from '../equation/format-equation';
import { Rational } from '../rational/rational';
import type { BalancedTerm, BalanceResult } from './balance-result';
import type { PinnedSolution } from './solve-pinned';

function otherSide(side: Side): Side {
  return side === 'left' ? 'right' : 'left';
}

function placeTerm(term: EquationTerm, value: Rational): BalancedTerm {
  return {
    formula: term.formula.text,
    side: value.sign() < 0 ? otherSide(term.side) : term.side,
    coefficient: value.abs(),
    span: term.span,
  };
}

function speciesWarnings(equation: Equation, values: readonly Rational[]): ChemWarning[] {
  const warnings: ChemWarning[] = [];
  equation.terms.forEach((term, index) => {
    const species = term.formula.text;
    if (values[index].isZero()) {
      warnings.push({ code: 'BALANCE_SPECIES_UNUSED', message: `${species} takes no part in the balance.`, species, span: term.span });
    } else if (values[index].sign() < 0) {
      const side = otherSide(term.side);
      warnings.push({ code: 'BALANCE_SPECIES_MOVED', message: `${species} was moved to the ${side}-hand side.`, species, span: term.span });
    }
  });
  return warnings;
}

function canonicalText(equation: Equation, terms: readonly BalancedTerm[]): string {
  const placed = terms
    .map((term, index) => ({ formula: equation.terms[index].formula, side: term.side, coefficient: term.coefficient }))
    .filter((term) => term.coefficient !== null && !term.coefficient.isZero());
  const ordered = [...placed.filter((term) => term.side === 'left'), ...placed.filter((term) => term.side === 'right')];
  return formatEquation(ordered);
}

function normalizeValues(
  equation: Equation,
  values: readonly Rational[],
  normalize: number | null,
  warnings: ChemWarning[],
): readonly Rational[] {
  if (normalize === null) return values;
  const reference = values[normalize];
  if (!reference.isZero()) return values.map((value) => value.div(reference.abs()));
  const species = equation.terms[normalize].formula.text;
  warnings.push({
    code: 'BALANCE_NORMALIZE_IGNORED',
    message: `${species} takes no part, so the result cannot be scaled to one mole of it.`,
    species,
  });
  return values;
}

/**
 * The result for one balance `values` (signed: negative means the species moved sides),
 * optionally scaled to one mole of the term at index `normalize`.
 */
export function finishBalanced(
  equation: Equation,
  values: readonly Rational[],
  normalize: number | null,
): BalanceResult {
  const warnings = speciesWarnings(equation, values);
  const scaled = normalizeValues(equation, values, normalize, warnings);
  const terms = equation.terms.map((term, index) => placeTerm(term, scaled[index]));
  return { status: 'balanced', freedom: 1, terms, equation: canonicalText(equation, terms), warnings };
}

function basisText(equation: Equation, vector: readonly bigint[]): string {
  const terms = equation.terms.map((term, index) => placeTerm(term, Rational.of(vector[index])));
  return canonicalText(equation, terms);
}

function determinedValue(pinned: PinnedSolution | null, index: number): Rational | null {
  if (pinned === null || pinned.particular === null) return null;
  const isFixed = pinned.directions.every((direction) => direction[index] === 0n);
  return isFixed ? pinned.particular[index] : null;
}

/**
 * The result for a system with several independent balances: coefficients that the pins fix
 * are given, the others are `null`; `balances` lists one canonical equation per basis vector.
 */
export function describeOpen(
  equation: Equation,
  basis: readonly (readonly bigint[])[],
  freedom: number,
  pinned: PinnedSolution | null,
): BalanceResult {
  const isUnused = (index: number): boolean => basis.every((vector) => vector[index] === 0n);
  const warnings: ChemWarning[] = [];
  const terms = equation.terms.map((term, index): BalancedTerm => {
    if (isUnused(index)) {
      const species = term.formula.text;
      warnings.push({ code: 'BALANCE_SPECIES_UNUSED', message: `${species} takes no part in any balance.`, species, span: term.span });
    }
    const value = determinedValue(pinned, index);
    return value === null ? { formula: term.formula.text, side: term.side, coefficient: null, span: term.span } : placeTerm(term, value);
  });
  return {
    status: 'open',
    freedom,
    terms,
    equation: formatEquation(equation.terms),
    warnings,
    balances: basis.map((vector) => basisText(equation, vector)),
  };
}
