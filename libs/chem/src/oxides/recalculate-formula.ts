/**
 * Mineral formulas from oxide weight percents: atoms per formula unit (apfu) on an oxygen basis
 * (Brady & Perkins, SERC "Mineral formulae recalculation"), with Fe3+ estimated from stoichiometry
 * after Droop (1987, Mineral. Mag. 51, 431–435). Numbers are doubles: analyses are measurements.
 */
import { ChemError } from '../errors/chem-error';
import { findMineralGroup, findOxide, oxideMolarMass, type MineralGroup, type OxideEntry } from './oxide-table';
import { OXIDE_WARNINGS, type OxideWarning } from './oxide-warnings';
import { endMembersOf, type EndMembers } from './end-members';

/** Input of {@link recalculateFormula}. */
export interface OxideAnalysis {
  /** Weight percent by oxide key (see `OXIDES`). */
  readonly oxides: Readonly<Record<string, number>>;
  /** Oxygens per formula unit; default from `group`. */
  readonly oxygens?: number;
  /** Mineral group (`feldspar`, `olivine`, …): default basis, end members, Droop applicability. */
  readonly group?: string;
  /** `droop`: estimate Fe3+ from stoichiometry (needs `cations` or a group with fixed cations). */
  readonly ferric?: 'droop';
  /** Ideal cations per formula unit (T of Droop). */
  readonly cations?: number;
  /** `exclude` (default): H2O and CO2 are left out (anhydrous basis); `include`: H and C count. */
  readonly volatiles?: 'exclude' | 'include';
}

/** Fe2+/Fe3+ split in apfu. */
export interface FerricIron {
  /** `droop` (estimated) or `analysed` (FeO and Fe2O3 both reported). */
  readonly method: 'droop' | 'analysed';
  readonly ferrous: number;
  readonly ferric: number;
  /** Droop's S (observed cations on the oxygen basis, all Fe as Fe2+) and T (ideal cations). */
  readonly observedCations?: number;
  readonly idealCations?: number;
}

/** Result of {@link recalculateFormula}. */
export interface FormulaRecalculation {
  /** Atoms per formula unit by element (Fe is total iron; see `ferricIron` for the split). */
  readonly apfu: Readonly<Record<string, number>>;
  readonly oxygens: number;
  /** Sum of cations (F and Cl left out). */
  readonly total: number;
  /** Sum of the analysed weight percents. */
  readonly oxideTotal: number;
  readonly ferricIron?: FerricIron;
  readonly endMembers?: EndMembers;
  readonly warnings: readonly OxideWarning[];
}

interface Moles {
  cations: Map<string, number>;
  oxygen: number;
  ferrous: number;
  ferric: number;
}

function fail(code: 'OXIDES_BAD_VALUE' | 'OXIDES_BAD_BASIS' | 'OXIDES_UNKNOWN_OXIDE' | 'OXIDES_UNKNOWN_GROUP', message: string, text: string, field: string): ChemError {
  return new ChemError(code, message, { start: 0, end: text.length }, { field });
}

function readEntry(key: string, value: number): OxideEntry {
  const entry = findOxide(key);
  if (entry === undefined) throw fail('OXIDES_UNKNOWN_OXIDE', `Unknown oxide "${key}".`, key, `oxides.${key}`);
  if (typeof value !== 'number' || !Number.isFinite(value) || value < 0 || value > 100) {
    throw fail('OXIDES_BAD_VALUE', 'A weight percent lies between 0 and 100.', String(value), `oxides.${key}`);
  }
  return entry;
}

function checkIron(oxides: Readonly<Record<string, number>>): void {
  const forms = ['FeO', 'Fe2O3', 'FeOT', 'Fe2O3T'].filter((key) => oxides[key] !== undefined);
  if (forms.some((key) => key.endsWith('T')) && forms.length > 1) {
    throw fail('OXIDES_BAD_VALUE', 'Give total iron (FeOT or Fe2O3T) alone, or FeO and Fe2O3.', forms[1], `oxides.${forms[1]}`);
  }
}

/** Moles of cations and oxygen per 100 g; with `allFerrous`, every Fe counts as FeO. */
function toMoles(analysis: OxideAnalysis, allFerrous: boolean): Moles {
  const moles: Moles = { cations: new Map(), oxygen: 0, ferrous: 0, ferric: 0 };
  for (const [key, value] of Object.entries(analysis.oxides)) {
    const entry = readEntry(key, value);
    if (entry.isVolatile && analysis.volatiles !== 'include') continue;
    const mol = value / oxideMolarMass(entry);
    const atoms = mol * entry.atoms;
    const isFerric = entry.iron === 'ferric' || entry.iron === 'total-as-Fe2O3';
    moles.oxygen += entry.iron !== undefined && allFerrous ? atoms : mol * entry.oxygens;
    if (entry.iron !== undefined && isFerric && !allFerrous) moles.ferric += atoms;
    else if (entry.iron !== undefined) moles.ferrous += atoms;
    moles.cations.set(entry.element, (moles.cations.get(entry.element) ?? 0) + atoms);
  }
  return moles;
}

function cationSum(apfu: Readonly<Record<string, number>>): number {
  return Object.entries(apfu).reduce((sum, [element, value]) => (element === 'F' || element === 'Cl' ? sum : sum + value), 0);
}

function basisOf(analysis: OxideAnalysis, group: MineralGroup | undefined): number {
  const oxygens = analysis.oxygens ?? group?.oxygens;
  if (oxygens === undefined || !Number.isFinite(oxygens) || oxygens <= 0) {
    throw fail('OXIDES_BAD_BASIS', 'Give the number of oxygens (or a mineral group).', String(oxygens ?? ''), 'oxygens');
  }
  return oxygens;
}

function groupOf(analysis: OxideAnalysis): MineralGroup | undefined {
  if (analysis.group === undefined) return undefined;
  const group = findMineralGroup(analysis.group);
  if (group === undefined) throw fail('OXIDES_UNKNOWN_GROUP', `Unknown mineral group "${analysis.group}".`, analysis.group, 'group');
  return group;
}

function scaled(moles: Moles, factor: number): Record<string, number> {
  return Object.fromEntries([...moles.cations].map(([element, value]) => [element, value * factor]));
}

/**
 * Droop (1987): F = 2X(1 − T/S) Fe3+ per X oxygens, S the cation total with all Fe as Fe2+;
 * cations are then scaled to T. With S ≤ T there is no Fe3+ to estimate.
 */
function applyDroop(apfu: Record<string, number>, oxygens: number, ideal: number, warnings: OxideWarning[]): { apfu: Record<string, number>; ferric: FerricIron } {
  const observed = cationSum(apfu);
  const iron = apfu.Fe ?? 0;
  if (observed <= ideal) {
    warnings.push(OXIDE_WARNINGS.DROOP_NO_EXCESS);
    return { apfu, ferric: { method: 'droop', ferrous: iron, ferric: 0, observedCations: observed, idealCations: ideal } };
  }
  const estimate = 2 * oxygens * (1 - ideal / observed);
  const result = Object.fromEntries(Object.entries(apfu).map(([element, value]) => [element, element === 'F' || element === 'Cl' ? value : (value * ideal) / observed]));
  const total = result.Fe ?? 0;
  if (estimate > total) warnings.push(OXIDE_WARNINGS.DROOP_EXCEEDS_IRON);
  const ferric = Math.min(estimate, total);
  return { apfu: result, ferric: { method: 'droop', ferrous: total - ferric, ferric, observedCations: observed, idealCations: ideal } };
}

function idealCations(analysis: OxideAnalysis, group: MineralGroup | undefined, warnings: OxideWarning[]): number {
  const ideal = analysis.cations ?? group?.cations ?? undefined;
  if (ideal === undefined || ideal === null || !Number.isFinite(ideal) || ideal <= 0) {
    throw fail('OXIDES_BAD_BASIS', 'Droop needs the ideal number of cations (cations).', String(ideal ?? ''), 'cations');
  }
  if (group !== undefined && !group.isDroopApplicable) warnings.push(OXIDE_WARNINGS.DROOP_NOT_APPLICABLE);
  return ideal;
}

/**
 * Atoms per formula unit from oxide weight percents on `oxygens` oxygens, optionally with Fe3+
 * after Droop (1987), end-member fractions for feldspar and olivine, and warnings.
 * @throws ChemError OXIDES_UNKNOWN_OXIDE, OXIDES_BAD_VALUE, OXIDES_BAD_BASIS, OXIDES_UNKNOWN_GROUP
 *   (details.field, e.g. `oxides.FeO`)
 * @example
 * recalculateFormula({ oxides: { FeO: 93.09 }, oxygens: 4, ferric: 'droop', cations: 3 }).ferricIron;
 * // { method: 'droop', ferrous: ≈1, ferric: ≈2, observedCations: 4, idealCations: 3 } (magnetite)
 */
export function recalculateFormula(analysis: OxideAnalysis): FormulaRecalculation {
  checkIron(analysis.oxides ?? {});
  const group = groupOf(analysis);
  const oxygens = basisOf(analysis, group);
  const warnings: OxideWarning[] = [];
  const isDroop = analysis.ferric === 'droop';
  const moles = toMoles(analysis, isDroop);
  if (moles.oxygen <= 0) throw fail('OXIDES_BAD_VALUE', 'The analysis holds no oxygen-bearing oxide.', '', 'oxides');
  const factor = oxygens / moles.oxygen;
  let apfu = scaled(moles, factor);
  let ferricIron: FerricIron | undefined;
  if (isDroop) ({ apfu, ferric: ferricIron } = applyDroop(apfu, oxygens, idealCations(analysis, group, warnings), warnings));
  else if (moles.ferric > 0) ferricIron = { method: 'analysed', ferrous: moles.ferrous * factor, ferric: moles.ferric * factor };
  const oxideTotal = Object.values(analysis.oxides).reduce((sum, value) => sum + value, 0);
  if (oxideTotal < 98.5 || oxideTotal > 101.5) warnings.push(OXIDE_WARNINGS.TOTAL_OUT_OF_RANGE);
  const endMembers = endMembersOf(apfu, ferricIron?.ferrous ?? apfu.Fe ?? 0, group?.key);
  return { apfu, oxygens, total: cationSum(apfu), oxideTotal, ...(ferricIron ? { ferricIron } : {}), ...(endMembers ? { endMembers } : {}), warnings };
}
