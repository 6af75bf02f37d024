/**
 * Operational valence: the redox bookkeeping of the "electrons" constraint of a mass balance.
 *
 * u(species) = Σ atoms × oxidation state over the redox elements (state measured from 0), plus
 * Σ O atoms × (state + 2) and Σ H atoms × (state − 1). Other elements (Ca, Na, Si, Al, Cl, …) keep
 * one state and count 0. Since the oxidation states of a species add up to its charge, u is
 * conserved by every reaction balanced in elements and charge; so the electrons taken up by a
 * water (Δ Σ m·u of its solutes) must equal Σ transfer × u(phase). Examples: O2 +4 (it accepts
 * 4 e−), pyrite FeS2 0, Fe2+ +2, SO4^2- +6, HCO3- +4, CH2O 0, Fe(OH)3 +3.
 */
import type { Formula } from '../formula/formula';
import { assignOxidationStates } from '../oxidation/oxidation-states';
import { Rational } from '../rational/rational';

/** Elements whose oxidation state varies in natural waters; their states count from 0. */
export const REDOX_ELEMENTS: ReadonlySet<string> = new Set([
  'C', 'N', 'S', 'Fe', 'Mn', 'As', 'Cu', 'Cr', 'Se', 'U', 'V', 'Mo', 'Co', 'Sb', 'Hg',
]);

/**
 * The operational valence of one mole of a species.
 * @throws ChemError OXIDATION_UNDETERMINED when the rules cannot assign the states
 * @example operationalValence(parseFormula('O2')).toString(); // "4"
 */
export function operationalValence(formula: Formula): Rational {
  if (formula.isElectron) return Rational.of(-1);
  const states = assignOxidationStates(formula);
  let total = Rational.ZERO;
  for (const [symbol, count] of formula.composition) {
    const state = states.get(symbol) ?? Rational.ZERO;
    if (REDOX_ELEMENTS.has(symbol)) total = total.add(count.mul(state));
    else if (symbol === 'O') total = total.add(count.mul(state.add(Rational.of(2))));
    else if (symbol === 'H') total = total.add(count.mul(state.sub(Rational.ONE)));
  }
  return total;
}
