/**
 * Acid and neutralisation potential from mineral modes, derived from each mineral's balanced
 * reaction and proton budget (libs/chem), in kg CaCO3 per tonne.
 */
import { balanceEquation } from '../balance/balance-equation';
import { protonBudget } from '../budget/proton-budget';
import { CACO3_MOLAR_MASS, molarMassExact } from '../convert/molar-mass';
import { ChemError } from '../errors/chem-error';
import { parseEquation } from '../equation/parse-equation';
import { Rational } from '../rational/rational';
import { classifyNpr, type AbaClass } from './acid-base-accounting';

/**
 * Where carbonate neutralisation ends: `co2` (CaCO3 + 2 H+ -> Ca2+ + CO2 + H2O; 2 H+ per CaCO3, the
 * basis of 31.25) or `bicarbonate` (CaCO3 + H+ -> Ca2+ + HCO3-; 1 H+ per CaCO3, Dold 2017's 62.5).
 * kg CaCO3 equivalents follow the same end point, so sulfide AP doubles under `bicarbonate`.
 */
export type CarbonatePathway = 'co2' | 'bicarbonate';

/** Minerals with built-in reactions. */
export const ABA_MINERALS = ['pyrite', 'pyrrhotite', 'chalcopyrite', 'calcite', 'dolomite', 'ankerite', 'siderite'] as const;
export type AbaMineral = (typeof ABA_MINERALS)[number];

/** Options of {@link mineralAcidBase} and {@link mineralFactor}. */
export interface MineralAbaOptions {
  readonly pathway?: CarbonatePathway;
  /** x of pyrrhotite Fe(1−x)S, 0 to 0.125 (default 0: FeS). */
  readonly pyrrhotiteX?: number;
  /** Ankerite formula (default CaFe0.5Mg0.5(CO3)2). */
  readonly ankerite?: string;
}

/** Caution about iron carbonates, shared by API, client and report. */
export const SIDERITE_CAUTION =
  'Siderite (and the Fe of ankerite) neutralises acid in the NP test, but once Fe2+ oxidises and hydrolyses to Fe(OH)3 the acid returns: its long-term NP is 0 with CO2 as end point, and it is net acid-producing with HCO3- as end point (Skousen et al. 1997; Dold 2017). NP here is the long-term figure; apparentNeutralisationPotential shows what an acid digestion would report.';

function carbon(pathway: CarbonatePathway): string {
  return pathway === 'co2' ? 'CO2 + H2O' : 'HCO3-';
}

/** Carbon product of reactions that already hold H2O on the left. */
function carbonOnly(pathway: CarbonatePathway): string {
  return pathway === 'co2' ? 'CO2' : 'HCO3-';
}

/** The long-term reaction (Fe to Fe(OH)3) and, for iron carbonates, the apparent one (Fe2+). */
function reactions(mineral: AbaMineral, options: MineralAbaOptions): { formula: string; longTerm: string; apparent?: string } {
  const pathway = options.pathway ?? 'co2';
  const iron = 'Fe(OH)3';
  switch (mineral) {
    case 'pyrite':
      return { formula: 'FeS2', longTerm: `FeS2 + O2 + H2O -> ${iron} + SO4^2- + H+` };
    case 'pyrrhotite': {
      const x = Rational.fromNumber(options.pyrrhotiteX ?? 0);
      const formula = x.isZero() ? 'FeS' : `Fe${Rational.ONE.sub(x).toDecimalString()}S`;
      return { formula, longTerm: `${formula} + O2 + H2O -> ${iron} + SO4^2- + H+` };
    }
    case 'chalcopyrite':
      return { formula: 'CuFeS2', longTerm: `CuFeS2 + O2 + H2O -> Cu^2+ + ${iron} + SO4^2- + H+` };
    case 'calcite':
      return { formula: 'CaCO3', longTerm: `CaCO3 + H+ -> Ca^2+ + ${carbon(pathway)}` };
    case 'dolomite':
      return { formula: 'CaMg(CO3)2', longTerm: `CaMg(CO3)2 + H+ -> Ca^2+ + Mg^2+ + ${carbon(pathway)}` };
    case 'ankerite': {
      const formula = options.ankerite ?? 'CaFe0.5Mg0.5(CO3)2';
      return {
        formula,
        longTerm: `${formula} + H+ + O2 + H2O -> Ca^2+ + Mg^2+ + ${iron} + ${carbonOnly(pathway)}`,
        apparent: `${formula} + H+ -> Ca^2+ + Mg^2+ + Fe^2+ + ${carbon(pathway)}`,
      };
    }
    case 'siderite':
      return { formula: 'FeCO3', longTerm: `FeCO3 + H+ + O2 + H2O -> ${iron} + ${carbonOnly(pathway)}`, apparent: `FeCO3 + H+ -> Fe^2+ + ${carbon(pathway)}` };
  }
}

/** A mineral's reaction and its kg CaCO3/t per wt% (+ acid, − neutralising). */
export interface MineralFactor {
  readonly mineral: AbaMineral;
  readonly formula: string;
  readonly equation: string;
  /** Net mol H+ produced per mol of mineral (exact). */
  readonly protonsPerMole: Rational;
  readonly kgCaco3PerTonnePerPercent: number;
  /** For siderite and ankerite: the factor an acid digestion sees (Fe stays Fe2+). */
  readonly apparentKgCaco3PerTonnePerPercent?: number;
}

function factorOf(text: string, formula: string, pathway: CarbonatePathway): { equation: string; perMole: Rational; perPercent: number } {
  const balanced = balanceEquation(text, { normalizeTo: formula });
  if (balanced.status !== 'balanced' || balanced.equation === null) throw new Error(`ABA reaction does not balance: ${text}`);
  const perMole = protonBudget(parseEquation(balanced.equation), { reference: formula }).perMole;
  const protonsPerCaco3 = pathway === 'co2' ? 2 : 1;
  // 1 wt% = 10 kg/t = 10^4 g/t; kg CaCO3 = mol H+ × M(CaCO3) / (H+ per CaCO3) / 1000.
  const perPercent = perMole.mul(Rational.of(10000)).div(molarMassExact(formula)).mul(CACO3_MOLAR_MASS).div(Rational.of(protonsPerCaco3 * 1000));
  return { equation: balanced.equation, perMole, perPercent: perPercent.toNumber() };
}

/**
 * kg CaCO3 equivalent per tonne per wt% of a mineral, from its balanced reaction.
 * @throws ChemError ABA_UNKNOWN_MINERAL, ABA_BAD_INPUT (pyrrhotite x outside 0–0.125)
 * @example mineralFactor('pyrite').kgCaco3PerTonnePerPercent; // ≈ 16.686 (= 31.22 × 0.5345)
 */
export function mineralFactor(mineral: string, options: MineralAbaOptions = {}): MineralFactor {
  if (!(ABA_MINERALS as readonly string[]).includes(mineral)) {
    throw new ChemError('ABA_UNKNOWN_MINERAL', `No built-in reaction for "${mineral}"; use one of ${ABA_MINERALS.join(', ')}.`, { start: 0, end: mineral.length }, { field: mineral });
  }
  const x = options.pyrrhotiteX ?? 0;
  if (!Number.isFinite(x) || x < 0 || x > 0.125) {
    throw new ChemError('ABA_BAD_INPUT', 'Pyrrhotite x lies from 0 (FeS) to 0.125 (Fe7S8).', { start: 0, end: String(x).length }, { field: 'pyrrhotiteX' });
  }
  const pathway = options.pathway ?? 'co2';
  const known = mineral as AbaMineral;
  const { formula, longTerm, apparent } = reactions(known, options);
  const main = factorOf(longTerm, formula, pathway);
  const result = { mineral: known, formula, equation: main.equation, protonsPerMole: main.perMole, kgCaco3PerTonnePerPercent: main.perPercent };
  return apparent === undefined ? result : { ...result, apparentKgCaco3PerTonnePerPercent: factorOf(apparent, formula, pathway).perPercent };
}

/** Result of {@link mineralAcidBase}; kg CaCO3/t. */
export interface MineralAbaResult {
  readonly acidPotential: number;
  readonly neutralisationPotential: number;
  /** NP an acid digestion would report (iron carbonates counted with Fe2+). */
  readonly apparentNeutralisationPotential: number;
  readonly netNeutralisationPotential: number;
  readonly neutralisationPotentialRatio: number | null;
  readonly classification: AbaClass;
  readonly minerals: readonly (MineralFactor & { readonly weightPercent: number; readonly contribution: number })[];
  readonly cautions: readonly string[];
}

/**
 * AP and NP of a rock from its mineral modes (wt%), each mineral through its reaction.
 * @throws ChemError ABA_UNKNOWN_MINERAL, ABA_BAD_INPUT (details.field names the mineral)
 * @example mineralAcidBase({ pyrite: 1, calcite: 2 }).netNeutralisationPotential; // ≈ 20 − 16.686
 */
export function mineralAcidBase(modes: Readonly<Record<string, number>>, options: MineralAbaOptions = {}): MineralAbaResult {
  const minerals = Object.entries(modes).map(([mineral, percent]) => {
    if (typeof percent !== 'number' || !Number.isFinite(percent) || percent < 0 || percent > 100) {
      throw new ChemError('ABA_BAD_INPUT', 'A mode lies from 0 to 100 wt%.', { start: 0, end: String(percent).length }, { field: `modes.${mineral}` });
    }
    const factor = mineralFactor(mineral, options);
    return { ...factor, weightPercent: percent, contribution: factor.kgCaco3PerTonnePerPercent * percent };
  });
  const ap = minerals.reduce((sum, entry) => sum + Math.max(0, entry.contribution), 0);
  const np = minerals.reduce((sum, entry) => sum + Math.max(0, -entry.contribution), 0);
  const apparent = minerals.reduce((sum, entry) => sum + Math.max(0, -(entry.apparentKgCaco3PerTonnePerPercent ?? entry.kgCaco3PerTonnePerPercent) * entry.weightPercent), 0);
  const npr = ap === 0 ? null : np / ap;
  const hasIronCarbonate = minerals.some((entry) => entry.apparentKgCaco3PerTonnePerPercent !== undefined);
  return {
    acidPotential: ap,
    neutralisationPotential: np,
    apparentNeutralisationPotential: apparent,
    netNeutralisationPotential: np - ap,
    neutralisationPotentialRatio: npr,
    classification: classifyNpr(npr),
    minerals,
    cautions: hasIronCarbonate ? [SIDERITE_CAUTION] : [],
  };
}
