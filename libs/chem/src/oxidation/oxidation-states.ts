/**
 * Oxidation states of the elements of one species: explicit states first, then the usual rules,
 * the sulfide rule, and the charge for the one element left over. Average states may be
 * fractional (Fe 8/3 in Fe3O4).
 */
import { ChemError, type Span } from '../errors/chem-error';
import type { Formula } from '../formula/formula';
import { Rational } from '../rational/rational';
import { RULES, SULFIDE_CATIONS } from './oxidation-rules';

/** Oxidation state of each element of a species. */
export type OxidationStates = ReadonlyMap<string, Rational>;

function sumOf(formula: Formula, states: ReadonlyMap<string, Rational>): Rational {
  let total = Rational.ZERO;
  for (const [symbol, state] of states) total = total.add(state.mul(formula.composition.get(symbol) ?? Rational.ZERO));
  return total;
}

function remainder(formula: Formula, states: Map<string, Rational>, symbol: string): void {
  const rest = formula.charge.sub(sumOf(formula, states));
  states.set(symbol, rest.div(formula.composition.get(symbol) ?? Rational.ONE));
}

function undetermined(formula: Formula, span: Span, unknown: readonly string[]): ChemError {
  return new ChemError(
    'OXIDATION_UNDETERMINED',
    `The rules cannot decide the oxidation states of ${unknown.join(' and ')} in ${formula.text}; give them explicitly.`,
    span,
    { species: formula.text, elements: unknown },
  );
}

function applyRules(formula: Formula, states: Map<string, Rational>): string[] {
  const ruled: string[] = [];
  for (const [symbol, state] of RULES) {
    if (formula.composition.has(symbol) && !states.has(symbol)) {
      states.set(symbol, Rational.of(state));
      ruled.push(symbol);
    }
  }
  return ruled;
}

function applySulfideRule(formula: Formula, states: Map<string, Rational>, unknown: string[]): string[] {
  const isSulfide =
    unknown.includes('S') && unknown.every((symbol) => symbol === 'S' || SULFIDE_CATIONS.has(symbol));
  if (!isSulfide) return unknown;
  states.set('S', Rational.of(-2));
  return unknown.filter((symbol) => symbol !== 'S');
}

/** Relaxes rules from the lowest priority (O, then H, …) until the states add up to the charge. */
function reconcile(formula: Formula, states: Map<string, Rational>, ruled: readonly string[], span: Span): void {
  if (sumOf(formula, states).equals(formula.charge)) return;
  const relaxed = ruled[ruled.length - 1];
  if (relaxed !== undefined) {
    states.delete(relaxed);
    remainder(formula, states, relaxed);
    return;
  }
  throw new ChemError(
    'OXIDATION_BAD_STATE',
    `The oxidation states given for ${formula.text} do not add up to its charge ${formula.charge.toString()}.`,
    span,
    { species: formula.text },
  );
}

/**
 * Assigns the oxidation state of every element of `formula`.
 *
 * @param explicit states that take precedence (from the species catalogue or a built-in entry)
 * @param span where the species stands in the caller's text, for errors
 * @throws ChemError OXIDATION_UNDETERMINED when two or more elements have no rule (and no explicit
 *   state); OXIDATION_BAD_STATE when explicit states do not add up to the charge.
 * @example assignOxidationStates(parseFormula('Fe3O4')).get('Fe')?.toString(); // "8/3"
 * @example assignOxidationStates(parseFormula('SO4^2-')).get('S')?.toString(); // "6"
 */
export function assignOxidationStates(formula: Formula, explicit?: OxidationStates, span?: Span): OxidationStates {
  const where = span ?? formula.span;
  const states = new Map<string, Rational>();
  if (formula.isElectron) return states;
  for (const [symbol, state] of explicit ?? []) if (formula.composition.has(symbol)) states.set(symbol, state);
  const symbols = [...formula.composition.keys()];
  if (symbols.length === 1 && states.size === 0) {
    remainder(formula, states, symbols[0]);
    return states;
  }
  const ruled = applyRules(formula, states);
  let unknown = symbols.filter((symbol) => !states.has(symbol));
  if (unknown.length > 1) unknown = applySulfideRule(formula, states, unknown);
  if (unknown.length > 1) throw undetermined(formula, where, unknown);
  if (unknown.length === 1) remainder(formula, states, unknown[0]);
  else reconcile(formula, states, ruled, where);
  return states;
}
