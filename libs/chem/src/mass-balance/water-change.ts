/**
 * The change of a water's constrained quantities between the initial and the final analysis,
 * exact where the inputs are exact decimals.
 */
import { findElement } from '../elements/atomic-weights';
import { ChemError } from '../errors/chem-error';
import { parseFormula } from '../formula/parse-formula';
import { Rational } from '../rational/rational';
import { findSolute, type Solute } from '../water/solutes';
import { operationalValence } from './operational-valence';
import type { Constraint } from './phase-columns';

/** A water in mmol per kg of water: numbers or exact decimal text; `"<0.01"` counts 0. */
export type WaterComposition = Readonly<Record<string, number | string>>;

/** Exact amounts of one water, and the solutes reported below detection. */
export interface ReadWater {
  readonly amounts: ReadonlyMap<string, Rational>;
  readonly belowDetection: readonly string[];
}

function badValue(text: string, field: string): ChemError {
  return new ChemError('MASS_BALANCE_BAD_VALUE', `"${text}" is not an amount in mmol/kg.`, { start: 0, end: text.length }, { field });
}

function readAmount(value: number | string, field: string): { amount: Rational; below: boolean } {
  const text = String(value).trim();
  const below = text.startsWith('<');
  const amount = Rational.tryFrom(typeof value === 'number' ? value : below ? text.slice(1) : text);
  if (amount === null || amount.sign() < 0) throw badValue(text, field);
  return { amount: below ? Rational.ZERO : amount, below };
}

/**
 * Reads one water (keys from `SOLUTES`), exactly.
 * @param field the field path of the water, e.g. `initial`
 * @throws ChemError MASS_BALANCE_UNKNOWN_SOLUTE, MASS_BALANCE_BAD_VALUE (details.field)
 * @example readWater({ Ca: '0.068' }, 'initial').amounts.get('Ca')?.toString(); // "17/250"
 */
export function readWater(water: WaterComposition, field: string): ReadWater {
  const amounts = new Map<string, Rational>();
  const belowDetection: string[] = [];
  for (const [key, value] of Object.entries(water ?? {})) {
    if (findSolute(key) === undefined) {
      throw new ChemError('MASS_BALANCE_UNKNOWN_SOLUTE', `Unknown solute "${key}".`, { start: 0, end: key.length }, { field: `${field}.${key}` });
    }
    const read = readAmount(value, `${field}.${key}`);
    amounts.set(key, read.amount);
    if (read.below) belowDetection.push(key);
  }
  return { amounts, belowDetection };
}

/**
 * What one mmol of `solute` counts in `constraint` within a water that does or does not report DIC
 * (when it does, HCO3, CO3 and alkalinity add charge only: DIC holds all the carbon).
 * @example soluteCoefficient(findSolute('SO4')!, 'electrons', false).toString(); // "6"
 */
export function soluteCoefficient(solute: Solute, constraint: Constraint, hasDic: boolean): Rational {
  if (constraint === 'charge') return Rational.of(solute.charge);
  if (hasDic && solute.isCarbonateAlkalinity) return Rational.ZERO;
  if (constraint === 'electrons') return operationalValence(parseFormula(solute.species));
  return parseFormula(solute.formula).composition.get(constraint) ?? Rational.ZERO;
}

/**
 * Σ amount × coefficient over the solutes of one water, per constraint.
 * @example waterTotals(readWater({ Ca: 1, HCO3: 2 }, 'w'), ['Ca', 'C', 'charge']).map(String); // ["1", "2", "0"]
 */
export function waterTotals(water: ReadWater, constraints: readonly Constraint[]): Rational[] {
  const hasDic = water.amounts.has('DIC');
  return constraints.map((constraint) => {
    let total = Rational.ZERO;
    for (const [key, amount] of water.amounts) {
      const solute = findSolute(key);
      if (solute !== undefined) total = total.add(amount.mul(soluteCoefficient(solute, constraint, hasDic)));
    }
    return total;
  });
}

/**
 * Checks the constraint list: element symbols, `charge`, `electrons`, each once.
 * @throws ChemError MASS_BALANCE_BAD_CONSTRAINT (details.field `constraints.<i>`)
 * @example checkConstraints(['Ca', 'C', 'electrons']); // no error
 */
export function checkConstraints(constraints: readonly Constraint[]): void {
  if (!Array.isArray(constraints) || constraints.length === 0) {
    throw new ChemError('MASS_BALANCE_BAD_CONSTRAINT', 'List at least one constraint.', { start: 0, end: 0 }, { field: 'constraints' });
  }
  constraints.forEach((constraint, index) => {
    const text = String(constraint);
    const isKnown = text === 'charge' || text === 'electrons' || findElement(text) !== undefined;
    if (!isKnown || constraints.indexOf(constraint) !== index) {
      const reason = isKnown ? 'is listed twice' : 'is not an element symbol, "charge" or "electrons"';
      throw new ChemError('MASS_BALANCE_BAD_CONSTRAINT', `Constraint "${text}" ${reason}.`, { start: 0, end: text.length }, { field: `constraints.${index}` });
    }
  });
}
