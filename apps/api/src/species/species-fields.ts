import { assignOxidationStates, massToJson, parseFormula, phasedSpeciesKey, Rational } from '@tallus/chem';
import type { SpeciesOxidationStates } from '@tallus/contracts';
import { withChemPath } from '../site-data/chem-path';

/** What the server derives from a species' formula. */
export interface SpeciesFields {
  /** The formula as written, trimmed. */
  formula: string;
  molarMass: number;
  composition: Record<string, string>;
  charge: string;
  formulaKey: string;
}

/**
 * Parses a species' formula and checks its explicit oxidation states against
 * it, and computes molar mass (IUPAC 2021 abridged), exact composition, charge
 * and the identity key.
 *
 * @param formula the formula text
 * @param oxidationStates explicit states by element, or null
 * @throws ChemInputError at path `formula` (FORMULA_* with span) or `oxidationStates` (OXIDATION_*)
 */
export function computeSpeciesFields(formula: string, oxidationStates: SpeciesOxidationStates | null): SpeciesFields {
  const parsed = withChemPath(['formula'], () => parseFormula(formula));
  if (oxidationStates) {
    const states = new Map(Object.entries(oxidationStates).map(([symbol, value]): [string, Rational] => [symbol, Rational.parse(value)]));
    withChemPath(['oxidationStates'], () => assignOxidationStates(parsed, states));
  }
  const mass = massToJson(parsed);
  return { formula, molarMass: mass.molarMass, composition: mass.composition, charge: mass.charge, formulaKey: phasedSpeciesKey(parsed) };
}
