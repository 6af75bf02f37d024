/**
 * Electron budget of a reaction: electrons given up (+) or taken (−) by each element whose
 * oxidation state changes, the total transferred, and the O2 the reaction uses.
 */
import { ChemError, type Span } from '../errors/chem-error';
import type { Side } from '../equation/equation';
import type { Formula } from '../formula/formula';
import { parseFormula } from '../formula/parse-formula';
import { speciesKey } from '../formula/species-key';
import { Rational } from '../rational/rational';
import { BUILT_IN_STATES } from './oxidation-rules';
import { assignOxidationStates, type OxidationStates } from './oxidation-states';

/**
 * Explicit oxidation states by formula, e.g. `{ 'FeS2': { Fe: 2, S: -1 } }`; values may be
 * Rational, number or text (`"8/3"`). These override the built-in states.
 */
export type OxidationStateMap = Readonly<Record<string, Readonly<Record<string, Rational | number | string>>>>;

/** A term with its coefficient, as the budget needs it. */
export interface BudgetTerm {
  readonly formula: Formula;
  readonly coefficient: Rational;
  readonly side: Side;
  readonly span: Span;
}

/** The electron budget of a reaction as written. */
export interface ElectronBudget {
  /** Net electrons given up per element (+ oxidised, − reduced); elements with no change left out. */
  readonly byElement: ReadonlyMap<string, Rational>;
  /** Total electrons given up (the sum of the positive entries). */
  readonly transferred: Rational;
  /** Net O2 used: O2 on the left minus O2 on the right. */
  readonly o2Demand: Rational;
}

function readState(formulaText: string, symbol: string, value: Rational | number | string): Rational {
  const state = Rational.tryFrom(value);
  if (state !== null) return state;
  const text = String(value);
  throw new ChemError(
    'OXIDATION_BAD_STATE',
    `"${text}" is not an oxidation state of ${symbol} in ${formulaText}; give a number such as 2, -1 or 8/3.`,
    { start: 0, end: text.length },
    { species: formulaText, element: symbol },
  );
}

/** A lookup of explicit oxidation states by species. */
type StateLookup = (formula: Formula) => OxidationStates | undefined;

const NO_STATES: OxidationStateMap = {};

/** Built lookups by map object: a team's map is built once, not on every check (every keystroke). */
const lookups = new WeakMap<OxidationStateMap, StateLookup>();

function buildLookup(map: OxidationStateMap): StateLookup {
  const table = new Map<string, OxidationStates>();
  for (const [formulaText, states] of Object.entries(map)) {
    const entries = Object.entries(states).map(([symbol, value]): [string, Rational] => [symbol, readState(formulaText, symbol, value)]);
    table.set(speciesKey(parseFormula(formulaText)), new Map(entries));
  }
  return (formula) => {
    const key = speciesKey(formula);
    return table.get(key) ?? BUILT_IN_STATES.get(key);
  };
}

/**
 * Turns an {@link OxidationStateMap} into a lookup by species, falling back to built-in states.
 * The lookup is kept per map object, so a map must not be changed once it has been used.
 * @throws ChemError FORMULA_* codes for a key that does not parse (span in the key);
 *   OXIDATION_BAD_STATE for a state that is not a number (span in the value's text).
 */
export function oxidationStateLookup(map: OxidationStateMap = NO_STATES): StateLookup {
  let lookup = lookups.get(map);
  if (lookup === undefined) {
    lookup = buildLookup(map);
    lookups.set(map, lookup);
  }
  return lookup;
}

function isOxygenGas(formula: Formula): boolean {
  return formula.charge.isZero() && formula.composition.size === 1 && formula.composition.get('O')?.equals(Rational.of(2)) === true;
}

/**
 * Electrons given up and taken per element, and the O2 demand, for terms with coefficients.
 * @throws ChemError OXIDATION_UNDETERMINED, OXIDATION_BAD_STATE (span of the term).
 * @example
 * // FeS2 + 7/2 O2 + H2O -> Fe^2+ + 2 SO4^2- + 2 H+ : S gives up 14, O takes 14, O2 demand 7/2
 */
export function electronBudget(terms: readonly BudgetTerm[], map?: OxidationStateMap): ElectronBudget {
  const lookup = oxidationStateLookup(map);
  const totals = new Map<string, Rational>();
  let o2Demand = Rational.ZERO;
  for (const term of terms) {
    const signed = term.side === 'right' ? term.coefficient : term.coefficient.neg();
    const states = assignOxidationStates(term.formula, lookup(term.formula), term.span);
    for (const [symbol, state] of states) {
      const atoms = term.formula.composition.get(symbol) ?? Rational.ZERO;
      totals.set(symbol, (totals.get(symbol) ?? Rational.ZERO).add(signed.mul(atoms).mul(state)));
    }
    if (isOxygenGas(term.formula)) o2Demand = o2Demand.sub(signed);
  }
  const byElement = new Map([...totals].filter(([, value]) => !value.isZero()));
  const transferred = [...byElement.values()].reduce((sum, value) => (value.sign() > 0 ? sum.add(value) : sum), Rational.ZERO);
  return { byElement, transferred, o2Demand };
}
