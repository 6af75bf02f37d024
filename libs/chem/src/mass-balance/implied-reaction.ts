/**
 * The net reaction a mass-balance model implies: its phases times their transfers, turned into
 * the change of the water's solutes, closed with H2O and H+ by the balancer.
 */
import { balanceEquation } from '../balance/balance-equation';
import type { BalanceStatus } from '../balance/balance-result';
import { parseEquation } from '../equation/parse-equation';
import { formatFormula } from '../formula/format-formula';
import { parseFormula } from '../formula/parse-formula';
import { phasedSpeciesKey } from '../formula/species-key';
import { Rational } from '../rational/rational';
import { findSolute, SOLUTES } from '../water/solutes';
import { isDissolved, isSolvent, withExchangeSite } from './phase-columns';
import type { MassBalanceInput, MassBalanceModel } from './solve-mass-balance';
import { readWater } from './water-change';

/** The net reaction of a model. */
export interface ImpliedReaction {
  /** `balanced` when H2O and H+ close the reaction; otherwise what the balancer says. */
  readonly status: BalanceStatus;
  /** Canonical text (X written for the exchange site), or `null` when it does not close. */
  readonly equation: string | null;
}

type Net = Map<string, { text: string; amount: Rational }>;

function addSpecies(net: Net, text: string, amount: Rational): void {
  const key = phasedSpeciesKey(parseFormula(text));
  const entry = net.get(key);
  net.set(key, { text: entry?.text ?? formatFormula(parseFormula(text)), amount: (entry?.amount ?? Rational.ZERO).add(amount) });
}

function addPhases(net: Net, input: MassBalanceInput, model: MassBalanceModel): void {
  for (const name of model.phases) {
    const phase = input.phases.find((candidate) => candidate.name === name);
    const transfer = model.transfers[name];
    if (phase === undefined || transfer === undefined) continue;
    if (typeof phase.formula === 'string') {
      addSpecies(net, phase.formula, transfer.neg());
      continue;
    }
    // Dissolved terms are part of the measured water change; H2O and H+ are closed by the balancer.
    for (const term of parseEquation(withExchangeSite(phase.equation ?? '')).terms) {
      if (isDissolved(term.formula) || isSolvent(term.formula)) continue;
      const coefficient = (term.coefficient ?? Rational.ONE).mul(transfer);
      addSpecies(net, term.formula.text, term.side === 'left' ? coefficient.neg() : coefficient);
    }
  }
}

function isConstrained(text: string, input: MassBalanceInput): boolean {
  return [...parseFormula(text).composition.keys()].some((symbol) => input.constraints.includes(symbol));
}

/** The solutes of the water change that hold a constrained element, as their aqueous species. */
function addWaterChange(net: Net, input: MassBalanceInput): void {
  const before = readWater(input.initial, 'initial').amounts;
  const after = readWater(input.final, 'final').amounts;
  const hasDic = after.has('DIC') || before.has('DIC');
  for (const key of new Set([...before.keys(), ...after.keys()])) {
    const solute = findSolute(key);
    if (solute === undefined || (hasDic && solute.isCarbonateAlkalinity) || !isConstrained(solute.formula, input)) continue;
    const delta = (after.get(key) ?? Rational.ZERO).sub(before.get(key) ?? Rational.ZERO);
    // What the water gains is a product of the net reaction (positive, right-hand side).
    if (!delta.isZero()) addSpecies(net, solute.species, delta);
  }
}

/** One aqueous species per unconstrained element the net holds (Si: H4SiO4), left for the balancer. */
function closingSpecies(entries: readonly { text: string }[], input: MassBalanceInput): string[] {
  const elements = new Set(entries.flatMap((entry) => [...parseFormula(entry.text).composition.keys()]));
  const closing = new Set<string>();
  for (const symbol of elements) {
    if (symbol === 'H' || symbol === 'O' || input.constraints.includes(symbol)) continue;
    const solute = SOLUTES.find((candidate) => parseFormula(candidate.species).composition.has(symbol));
    if (solute !== undefined) closing.add(solute.species);
  }
  return [...closing];
}

function termText(text: string, amount: Rational): string {
  return `${amount.abs().toString()} ${text}`;
}

/**
 * The net reaction of one model of {@link solveMassBalance}: dissolved phases and consumed
 * solutes on the left, precipitated phases and gained solutes on the right, per kg of water
 * (mmol). Solutes appear with their measured change only when they hold a constrained element;
 * H2O, H+ and one aqueous species per unconstrained element (Si as H4SiO4, C as CO2(aq)) get the
 * coefficients that close the reaction, since the model says nothing about them.
 * @example impliedReaction(input, result.models[0]).equation;
 * // "1 CaCO3 + 1 CO2 + H2O -> 1 Ca^2+ + 2 HCO3-" (canonical form from the balancer)
 */
export function impliedReaction(input: MassBalanceInput, model: MassBalanceModel): ImpliedReaction {
  const net: Net = new Map();
  addPhases(net, input, model);
  addWaterChange(net, input);
  const entries = [...net.values()].filter((entry) => !entry.amount.isZero());
  const water = ['H2O', 'H+'].map((text) => phasedSpeciesKey(parseFormula(text)));
  const fixed = entries.filter((entry) => !water.includes(phasedSpeciesKey(parseFormula(entry.text))));
  const left = [...fixed.filter((entry) => entry.amount.sign() < 0).map((entry) => termText(entry.text, entry.amount)), 'H2O'];
  const right = [...fixed.filter((entry) => entry.amount.sign() > 0).map((entry) => termText(entry.text, entry.amount)), ...closingSpecies(fixed, input), 'H+'];
  const result = balanceEquation(`${left.join(' + ')} -> ${right.join(' + ')}`);
  const equation = result.status === 'balanced' && result.equation !== null ? result.equation.replace(/Xe(?![a-z])/g, 'X') : null;
  return { status: result.status, equation };
}
