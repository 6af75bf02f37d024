import {
  findMineralGroup,
  formulaText,
  isChemError,
  mineralCo2Uptake,
  OXIDE_WARNINGS,
  recalculateFormula,
  weatheringEquation,
  type FormulaRecalculation,
  type MineralCo2Uptake,
  type WeatheringProducts,
} from '@tallus/chem';

import { describeChemIssue } from '../core/error-messages';

/** What the user entered: oxide weight percents and the basis of the formula. */
export interface OxideInput {
  /** wt% by oxide key (`SiO2`, `FeOT`, …); blank entries are left out. */
  oxides: Readonly<Record<string, number | null>>;
  /** Mineral group key, or '' for none (then `oxygens` is needed). */
  group: string;
  /** Oxygens per formula unit; null takes the group's default. */
  oxygens: number | null;
  /** Whether to estimate Fe3+ after Droop (1987). */
  isDroop: boolean;
  /** Products of the weathering reaction. */
  products?: WeatheringProducts;
}

/** One row of the apfu table. */
export interface ApfuRow {
  element: string;
  apfu: number;
}

/** One end-member fraction, as a percentage. */
export interface EndMemberRow {
  key: string;
  label: string;
  percent: number;
}

/** The outcome of a recalculation for the screen. */
export type RecalculationView =
  | { status: 'empty' }
  | { status: 'invalid'; message: string; field: string | null }
  | {
      status: 'done';
      result: FormulaRecalculation;
      formula: string;
      rows: ApfuRow[];
      endMembers: EndMemberRow[];
      weathering: { status: string; equation: string | null };
      co2: MineralCo2Uptake | null;
    };

const END_MEMBER_LABELS: readonly [string, string][] = [
  ['An', 'Anorthite (An)'],
  ['Ab', 'Albite (Ab)'],
  ['Or', 'Orthoclase (Or)'],
  ['Fo', 'Forsterite (Fo)'],
  ['Fa', 'Fayalite (Fa)'],
  ['mgNumber', 'Mg number'],
];

/** Element order of the apfu table: tetrahedral first, then octahedral, then large cations, as formulas are read. */
const ROW_ORDER = ['Si', 'Ti', 'Al', 'Cr', 'V', 'Fe', 'Mn', 'Ni', 'Zn', 'Mg', 'Ca', 'Sr', 'Ba', 'Li', 'Na', 'K', 'P', 'S', 'C', 'H', 'F', 'Cl'];

/**
 * Recalculates an oxide analysis in the browser (libs/chem's `recalculateFormula`, Brady & Perkins;
 * Fe3+ after Droop 1987), with the formula text, end members, the mineral's weathering reaction and
 * its theoretical CO2 uptake. Bad values come back as a message naming the oxide.
 *
 * @param input the analysis as entered
 */
export function recalculate(input: OxideInput): RecalculationView {
  const oxides = Object.fromEntries(
    Object.entries(input.oxides).filter((entry): entry is [string, number] => typeof entry[1] === 'number' && Number.isFinite(entry[1]) && entry[1] !== 0),
  );
  if (Object.keys(oxides).length === 0) return { status: 'empty' };
  const group = input.group ? findMineralGroup(input.group) : undefined;
  const oxygens = input.oxygens ?? group?.oxygens ?? null;
  if (oxygens === null) return { status: 'invalid', message: 'Choose a mineral group or give the number of oxygens of the formula.', field: 'oxygens' };
  try {
    // Droop needs a fixed cation total; groups with vacancies (micas) have none: say so rather than fail.
    const isDroopImpossible = input.isDroop && group !== undefined && group.cations === null;
    const recalculated = recalculateFormula({
      oxides,
      oxygens,
      ...(input.group ? { group: input.group } : {}),
      ...(input.isDroop && !isDroopImpossible ? { ferric: 'droop' as const, ...(group?.cations ? { cations: group.cations } : {}) } : {}),
    });
    const result = isDroopImpossible ? { ...recalculated, warnings: [...recalculated.warnings, OXIDE_WARNINGS.DROOP_NOT_APPLICABLE] } : recalculated;
    const formula = formulaText(result.apfu, { oxygens: result.oxygens });
    return { status: 'done', result, formula, rows: apfuRows(result), endMembers: endMemberRows(result), weathering: weatheringOf(formula, input.products), co2: co2Of(formula) };
  } catch (error) {
    if (!isChemError(error)) throw error;
    const field = typeof error.details?.field === 'string' ? error.details.field : null;
    return { status: 'invalid', message: describeChemIssue(error.toIssue()), field };
  }
}

function apfuRows(result: FormulaRecalculation): ApfuRow[] {
  const rank = (element: string): number => (ROW_ORDER.includes(element) ? ROW_ORDER.indexOf(element) : ROW_ORDER.length);
  return Object.entries(result.apfu)
    .map(([element, apfu]) => ({ element, apfu }))
    .sort((a, b) => rank(a.element) - rank(b.element));
}

function endMemberRows(result: FormulaRecalculation): EndMemberRow[] {
  const members = (result.endMembers ?? {}) as Readonly<Record<string, number | undefined>>;
  return END_MEMBER_LABELS.flatMap(([key, label]) => {
    const value = members[key];
    return value === undefined ? [] : [{ key, label, percent: value * 100 }];
  });
}

function weatheringOf(formula: string, products: WeatheringProducts | undefined): { status: string; equation: string | null } {
  try {
    const balanced = weatheringEquation(formula, products);
    return { status: balanced.status, equation: balanced.equation };
  } catch {
    // A formula libs/chem cannot weather (e.g. nothing soluble in it) has no reaction to offer.
    return { status: 'invalid', equation: null };
  }
}

function co2Of(formula: string): MineralCo2Uptake | null {
  try {
    return mineralCo2Uptake(formula);
  } catch {
    return null;
  }
}
