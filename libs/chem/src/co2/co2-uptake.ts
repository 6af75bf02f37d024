/**
 * Theoretical CO2 uptake of minerals and rocks by weathering: per mineral from its cations, per
 * rock from modes, and from an oxide analysis by a Steinour-type formula (Renforth 2019).
 */
import { CO2_MOLAR_MASS, molarMassExact } from '../convert/molar-mass';
import { ChemError } from '../errors/chem-error';
import { parseFormula } from '../formula/parse-formula';
import { Rational } from '../rational/rational';

/** Cautions shown with every CO2 figure (API, client, report). */
export const CO2_CAUTIONS = {
  THEORETICAL:
    'Theoretical maximum assuming complete dissolution and capture: not a verified removal. Realised drawdown depends on mineralogy, grain size, kinetics and monitoring (CarbonPlan CDR Verification Framework).',
  CARBONATE_IN_ROCK: 'Carbon already held as carbonate in the rock is deducted: dissolving it takes up at most one CO2 per carbonate from the air (CarbonPlan 2023).',
  NON_CARBONIC_ACID: 'Weathering by non-carbonic acids (e.g. sulfuric acid from pyrite oxidation) takes up no CO2 and can release it from carbonates.',
  OCEAN_EFFICIENCY: 'Bicarbonate delivered to the ocean retains only about 70–95 % of the CO2 per unit alkalinity after re-equilibration (CarbonPlan).',
  IRON_EXCLUDED: 'Fe2+ is not counted: it oxidises and precipitates as Fe(III) hydroxide, giving its alkalinity back as acid.',
} as const;

/** CO2 per tonne of a mineral or rock, both end points. */
export interface Co2Uptake {
  /** t CO2 per t, dissolved-bicarbonate end point (1 CO2 per cation charge). */
  readonly bicarbonate: number;
  /** t CO2 per t, solid-carbonate end point (1 CO2 per divalent cation, ½ per monovalent). */
  readonly carbonate: number;
}

/** Per-mineral detail: exact mol CO2 per mol. */
export interface MineralCo2Uptake extends Co2Uptake {
  readonly formula: string;
  readonly molCo2PerMole: { readonly bicarbonate: Rational; readonly carbonate: Rational };
  readonly cautions: readonly string[];
}

const DIVALENT = ['Ca', 'Mg'];
const MONOVALENT = ['Na', 'K'];

function badInput(message: string, text: string, field: string): ChemError {
  return new ChemError('CO2_BAD_INPUT', message, { start: 0, end: text.length }, { field });
}

/**
 * CO2 uptake of one mineral from its formula: bicarbonate end point 2 CO2 per Ca, Mg and 1 per
 * Na, K; carbonate end point 1 per Ca, Mg and ½ per Na, K; minus the carbonate carbon the
 * mineral already holds (calcite: 1 and 0). Fe is left out (see `CO2_CAUTIONS.IRON_EXCLUDED`).
 * @throws ChemError FORMULA_* codes
 * @example mineralCo2Uptake('Mg2SiO4').bicarbonate; // ≈ 1.2512 (4 × 44.009 / 140.691)
 */
export function mineralCo2Uptake(formula: string): MineralCo2Uptake {
  const parsed = parseFormula(formula);
  const count = (symbols: readonly string[]): Rational => symbols.reduce((sum, symbol) => sum.add(parsed.composition.get(symbol) ?? Rational.ZERO), Rational.ZERO);
  const divalent = count(DIVALENT);
  const monovalent = count(MONOVALENT);
  const held = parsed.composition.get('C') ?? Rational.ZERO;
  const atLeastZero = (value: Rational): Rational => (value.sign() < 0 ? Rational.ZERO : value);
  const bicarbonate = atLeastZero(divalent.mul(Rational.of(2)).add(monovalent).sub(held));
  const carbonate = atLeastZero(divalent.add(monovalent.div(Rational.of(2))).sub(held));
  const perTonne = (moles: Rational): number => moles.mul(CO2_MOLAR_MASS).div(molarMassExact(parsed)).toNumber();
  const cautions: string[] = [CO2_CAUTIONS.THEORETICAL];
  if (!held.isZero()) cautions.push(CO2_CAUTIONS.CARBONATE_IN_ROCK);
  if (parsed.composition.has('Fe')) cautions.push(CO2_CAUTIONS.IRON_EXCLUDED);
  return { formula: parsed.text, bicarbonate: perTonne(bicarbonate), carbonate: perTonne(carbonate), molCo2PerMole: { bicarbonate, carbonate }, cautions };
}

/**
 * CO2 uptake of a rock from mineral modes (formula → wt%).
 * @throws ChemError CO2_BAD_INPUT (details.field `modes.<formula>`), FORMULA_*
 * @example rockCo2Uptake({ Mg2SiO4: 50, SiO2: 50 }).bicarbonate; // ≈ 0.6256
 */
export function rockCo2Uptake(modes: Readonly<Record<string, number>>): Co2Uptake & { readonly cautions: readonly string[] } {
  let bicarbonate = 0;
  let carbonate = 0;
  const cautions = new Set<string>([CO2_CAUTIONS.THEORETICAL, CO2_CAUTIONS.NON_CARBONIC_ACID, CO2_CAUTIONS.OCEAN_EFFICIENCY]);
  for (const [formula, percent] of Object.entries(modes)) {
    if (typeof percent !== 'number' || !Number.isFinite(percent) || percent < 0 || percent > 100) throw badInput('A mode lies from 0 to 100 wt%.', String(percent), `modes.${formula}`);
    const mineral = mineralCo2Uptake(formula);
    bicarbonate += (mineral.bicarbonate * percent) / 100;
    carbonate += (mineral.carbonate * percent) / 100;
    mineral.cautions.forEach((caution) => cautions.add(caution));
  }
  return { bicarbonate, carbonate, cautions: [...cautions] };
}

/** Result of {@link oxideCo2Potential}: kg CO2 per tonne of rock. */
export interface OxideCo2Potential {
  readonly carbonateKgPerTonne: number;
  readonly bicarbonateKgPerTonne: number;
  readonly cautions: readonly string[];
}

const TERMS = [['CaO', 1], ['MgO', 1], ['Na2O', 1], ['K2O', 1]] as const;

/**
 * CO2 potential from an oxide analysis (wt%), after the Steinour-type formula of Renforth (2019,
 * Nat. Commun. 10, 1401; recalled from memory): C = M(CO2)/100 × (α CaO/M(CaO) + β MgO/M(MgO)
 * + ε Na2O/M(Na2O) + θ K2O/M(K2O)) × 1000, with α = β = ε = θ = 1 for solid carbonates (1 CO2 per
 * CaO, MgO, Na2O, K2O). The bicarbonate form counts 1 CO2 per cation charge: 2 per oxide. CO2
 * already in the analysis (carbonate) is deducted once per mole in both forms, and SO3 (sulfate
 * bound to Ca) once per mole from the carbonate form and twice from the bicarbonate form.
 * @throws ChemError CO2_BAD_INPUT (details.field `oxides.<key>`)
 * @example oxideCo2Potential({ CaO: 10 }).carbonateKgPerTonne; // ≈ 78.48
 */
export function oxideCo2Potential(oxides: Readonly<Record<string, number>>): OxideCo2Potential {
  for (const [key, value] of Object.entries(oxides)) {
    if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > 100) throw badInput('A weight percent lies from 0 to 100.', String(value), `oxides.${key}`);
  }
  const moles = (key: string): number => (oxides[key] ?? 0) / molarMassExact(key).toNumber();
  const cations = TERMS.reduce((sum, [key, weight]) => sum + weight * moles(key), 0);
  const co2 = CO2_MOLAR_MASS.toNumber();
  const carbonateMol = Math.max(0, cations - moles('CO2') - moles('SO3'));
  const bicarbonateMol = Math.max(0, 2 * cations - moles('CO2') - 2 * moles('SO3'));
  const cautions: string[] = [CO2_CAUTIONS.THEORETICAL, CO2_CAUTIONS.NON_CARBONIC_ACID, CO2_CAUTIONS.OCEAN_EFFICIENCY];
  if ((oxides.CO2 ?? 0) > 0) cautions.push(CO2_CAUTIONS.CARBONATE_IN_ROCK);
  return { carbonateKgPerTonne: carbonateMol * co2 * 10, bicarbonateKgPerTonne: bicarbonateMol * co2 * 10, cautions };
}
