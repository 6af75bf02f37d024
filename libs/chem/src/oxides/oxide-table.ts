/**
 * Oxides of rock and mineral analyses, and the mineral groups whose formula basis Tallus knows.
 */
import { molarMassExact } from '../convert/molar-mass';

/** One analysed constituent: an oxide, total iron, or an anion (F, Cl) reported as the element. */
export interface OxideEntry {
  readonly key: string;
  /** The cation (or anion, for F and Cl) it holds. */
  readonly element: string;
  /** Atoms of `element` per formula of the oxide. */
  readonly atoms: number;
  /** Oxygen (or oxygen equivalent: ½ per F or Cl) per formula of the oxide. */
  readonly oxygens: number;
  /** Formula used for the molar mass. */
  readonly formula: string;
  /** Whether it is H2O or CO2, left out on an anhydrous basis. */
  readonly isVolatile: boolean;
  /** Whether it is iron, and in which form it was reported. */
  readonly iron?: 'ferrous' | 'ferric' | 'total-as-FeO' | 'total-as-Fe2O3';
}

function oxide(key: string, element: string, atoms: number, oxygens: number, formula = key): OxideEntry {
  return { key, element, atoms, oxygens, formula, isVolatile: key === 'H2O' || key === 'CO2' };
}

/**
 * The oxides Tallus reads. Iron: `FeO` (ferrous), `Fe2O3` (ferric), or total iron as `FeOT` or
 * `Fe2O3T` (one total only, without FeO/Fe2O3). FeO → Fe2O3 factor M(Fe2O3)/(2 M(FeO)) = 1.1113.
 * F and Cl are reported as the element and count half an oxygen each.
 */
export const OXIDES: readonly OxideEntry[] = [
  oxide('SiO2', 'Si', 1, 2),
  oxide('TiO2', 'Ti', 1, 2),
  oxide('Al2O3', 'Al', 2, 3),
  oxide('Cr2O3', 'Cr', 2, 3),
  oxide('V2O3', 'V', 2, 3),
  { ...oxide('Fe2O3', 'Fe', 2, 3), iron: 'ferric' },
  { ...oxide('FeO', 'Fe', 1, 1), iron: 'ferrous' },
  { ...oxide('FeOT', 'Fe', 1, 1, 'FeO'), iron: 'total-as-FeO' },
  { ...oxide('Fe2O3T', 'Fe', 2, 3, 'Fe2O3'), iron: 'total-as-Fe2O3' },
  oxide('MnO', 'Mn', 1, 1),
  oxide('NiO', 'Ni', 1, 1),
  oxide('ZnO', 'Zn', 1, 1),
  oxide('MgO', 'Mg', 1, 1),
  oxide('CaO', 'Ca', 1, 1),
  oxide('SrO', 'Sr', 1, 1),
  oxide('BaO', 'Ba', 1, 1),
  oxide('Li2O', 'Li', 2, 1),
  oxide('Na2O', 'Na', 2, 1),
  oxide('K2O', 'K', 2, 1),
  oxide('P2O5', 'P', 2, 5),
  oxide('SO3', 'S', 1, 3),
  oxide('H2O', 'H', 2, 1),
  oxide('CO2', 'C', 1, 2),
  oxide('F', 'F', 1, 0.5),
  oxide('Cl', 'Cl', 1, 0.5),
];

const BY_KEY: ReadonlyMap<string, OxideEntry> = new Map(OXIDES.map((entry) => [entry.key, entry]));

/**
 * The oxide with this key, or `undefined`.
 * @example findOxide('Al2O3')?.atoms; // 2
 */
export function findOxide(key: string): OxideEntry | undefined {
  return BY_KEY.get(key);
}

/**
 * Molar mass of an oxide in g/mol (IUPAC 2021 abridged weights).
 * @example oxideMolarMass(findOxide('SiO2')!); // 60.083
 */
export function oxideMolarMass(entry: OxideEntry): number {
  return molarMassExact(entry.formula).toNumber();
}

/** FeO → Fe2O3 conversion, M(Fe2O3)/(2·M(FeO)) = 1.1113 (NRCan CDoGS metadata quotes 1.1113). */
export const FEO_TO_FE2O3 = molarMassExact('Fe2O3').toNumber() / (2 * molarMassExact('FeO').toNumber());

/** A mineral group's formula basis. */
export interface MineralGroup {
  readonly key: string;
  /** Oxygens per formula unit (anhydrous basis for hydrous groups). */
  readonly oxygens: number;
  /** Ideal cations per formula unit, `null` where vacancies make it variable. */
  readonly cations: number | null;
  /** Whether Droop's (1987) Fe3+ estimate applies. */
  readonly isDroopApplicable: boolean;
}

/**
 * Default bases: feldspar 8 O / 5 cations (AT4O8); olivine 4 / 3 (M2SiO4); pyroxene 6 / 4
 * (M2T2O6); garnet 12 / 8 (X3Y2Z3O12); spinel 4 / 3 (AB2O4; the 32-O cell holds 8 of them);
 * ilmenite 3 / 2; mica 22 O (O20(OH)4 anhydrous; 11 for the half formula), vacancies, no Droop;
 * amphibole 23 O (anhydrous), 15 cations at most, Droop only with a fixed cation subset.
 * These are the usual conventions of mineral-formula recalculation (Deer, Howie & Zussman,
 * recalled from memory; 4 O olivine and 12 O garnet are in the worked examples of check-values
 * §6). Droop (1987) lists garnet, spinel, magnetite, pyroxene, sapphirine, ilmenite as suitable.
 */
export const MINERAL_GROUPS: readonly MineralGroup[] = [
  { key: 'feldspar', oxygens: 8, cations: 5, isDroopApplicable: true },
  { key: 'olivine', oxygens: 4, cations: 3, isDroopApplicable: true },
  { key: 'pyroxene', oxygens: 6, cations: 4, isDroopApplicable: true },
  { key: 'garnet', oxygens: 12, cations: 8, isDroopApplicable: true },
  { key: 'spinel', oxygens: 4, cations: 3, isDroopApplicable: true },
  { key: 'ilmenite', oxygens: 3, cations: 2, isDroopApplicable: true },
  { key: 'mica', oxygens: 22, cations: null, isDroopApplicable: false },
  { key: 'amphibole', oxygens: 23, cations: 15, isDroopApplicable: false },
];

/**
 * The mineral group with this key, or `undefined`.
 * @example findMineralGroup('garnet')?.oxygens; // 12
 */
export function findMineralGroup(key: string): MineralGroup | undefined {
  return MINERAL_GROUPS.find((group) => group.key === key);
}
