/**
 * Molar masses from the IUPAC 2021 abridged atomic weights, and the unit conversions built on
 * them (per kg, per tonne, t CO2 per t).
 */
import { findElement } from '../elements/atomic-weights';
import type { Formula } from '../formula/formula';
import { parseFormula } from '../formula/parse-formula';
import { Rational } from '../rational/rational';

function toFormula(formula: Formula | string): Formula {
  return typeof formula === 'string' ? parseFormula(formula) : formula;
}

/**
 * Exact molar mass in g/mol: the sum of abridged atomic weights times the exact composition.
 * The electron counts 0 (its mass, 0.00055 g/mol, is below the precision of the weights).
 * @throws ChemError FORMULA_* codes when given text that does not parse.
 * @example molarMassExact('CaCO3').toDecimalString(); // "100.086"
 */
export function molarMassExact(formula: Formula | string): Rational {
  let total = Rational.ZERO;
  for (const [symbol, count] of toFormula(formula).composition) {
    const element = findElement(symbol);
    if (element === undefined) throw new Error(`No atomic weight for ${symbol}`);
    total = total.add(element.atomicWeight.mul(count));
  }
  return total;
}

/**
 * Molar mass in g/mol as a number.
 * @throws ChemError FORMULA_* codes when given text that does not parse.
 * @example molarMass('Al2Si2O5(OH)4'); // 258.157
 */
export function molarMass(formula: Formula | string): number {
  return molarMassExact(formula).toNumber();
}

/** Exact molar mass of CaCO3, 100.086 g/mol: the unit of acid-base accounts. */
export const CACO3_MOLAR_MASS = molarMassExact('CaCO3');

/** Exact molar mass of CO2, 44.009 g/mol. */
export const CO2_MOLAR_MASS = molarMassExact('CO2');

/**
 * Moles of a species per kg of it (1000 / M).
 * @example molesPerKg('FeS2'); // ≈ 8.3358
 */
export function molesPerKg(formula: Formula | string): number {
  return Rational.of(1000).div(molarMassExact(formula)).toNumber();
}

/**
 * Tonnes of CO2 per tonne of a mineral that takes up `co2PerMole` mol CO2 per mol.
 * @example tonnesCo2PerTonne('Mg2SiO4', 4); // ≈ 1.2512 (bicarbonate path)
 */
export function tonnesCo2PerTonne(formula: Formula | string, co2PerMole: Rational | number): number {
  const moles = co2PerMole instanceof Rational ? co2PerMole : Rational.fromNumber(co2PerMole);
  return moles.mul(CO2_MOLAR_MASS).div(molarMassExact(formula)).toNumber();
}

/**
 * kg CaCO3 equivalent per tonne for `protonsPerTonne` mol H+ per tonne, at 2 mol H+ per mol
 * CaCO3 (CaCO3 + 2 H+ -> Ca2+ + CO2 + H2O: the convention behind the 31.25 × %S factor).
 * Positive: acid to neutralise; negative: neutralising capacity.
 * @example caco3KgPerTonne(623.8); // ≈ 31.22 (1 wt% S as pyrite)
 */
export function caco3KgPerTonne(protonsPerTonne: number): number {
  return (protonsPerTonne * CACO3_MOLAR_MASS.toNumber()) / 2 / 1000;
}
