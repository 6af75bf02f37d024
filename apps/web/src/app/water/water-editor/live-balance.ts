import {
  chargeBalance,
  findSolute,
  isChemError,
  parseConcentration,
  toMilliequivalentsPerLitre,
  toMillimolesPerLitre,
  type ChargeBalanceConvention,
  type ChargeBalanceResult,
  type ConcentrationUnit,
} from '@tallus/chem';

import { describeChemIssue } from '../../core/error-messages';

/** One solute row as typed. */
export interface SoluteRowInput {
  key: string;
  /** As reported: `12.5`, `<0.01`. */
  value: string;
  unit: string;
}

/** One solute converted in the browser. */
export interface SoluteRowView {
  key: string;
  label: string;
  mmolPerL: number | null;
  meqPerL: number | null;
  isBelowDetection: boolean;
  /** Why the row cannot be converted, in the user's terms. */
  error: string | null;
}

/** The charge balance computed as the user types, or why it cannot be. */
export interface LiveBalance {
  /** One entry per input row, in the same order; null for a row without solute or value. */
  rows: (SoluteRowView | null)[];
  balance: ChargeBalanceResult | null;
}

/**
 * Converts typed solutes with libs/chem (IUPAC 2021 molar masses) and computes the charge balance
 * error under the team's threshold and convention, so the analyst sees a flag before saving.
 * Rows without a value are left out; rows that cannot be read say why and stay out of the sums.
 *
 * @param rows the solute rows
 * @param options pH (adds H+ below 4.5), the team's threshold (%) and convention
 */
export function liveBalance(rows: readonly SoluteRowInput[], options: { pH: number | null; threshold: number; convention: ChargeBalanceConvention }): LiveBalance {
  const views: (SoluteRowView | null)[] = [];
  const solutes: Record<string, { value: string; unit: string }> = {};
  for (const row of rows) {
    if (row.key === '' || row.value.trim() === '') {
      views.push(null);
      continue;
    }
    const view = convertRow(row);
    views.push(view);
    if (view.error === null && solutes[row.key] === undefined) solutes[row.key] = { value: row.value.trim(), unit: row.unit };
  }
  let balance: ChargeBalanceResult | null = null;
  try {
    balance = chargeBalance({ solutes, ...(options.pH === null ? {} : { pH: options.pH }) }, { threshold: options.threshold, convention: options.convention });
  } catch (error) {
    if (!isChemError(error)) throw error;
    // Two rows for one quantity (HCO3 and alkalinity): the rows already say which; no balance until fixed.
    const field = String(error.details?.field ?? '');
    const culprit = views.find((view) => view !== null && field.includes(view.key));
    if (culprit) culprit.error = describeChemIssue(error.toIssue());
  }
  return { rows: views, balance };
}

function convertRow(row: SoluteRowInput): SoluteRowView {
  const solute = findSolute(row.key);
  const empty = { key: row.key, label: solute?.label ?? row.key, mmolPerL: null, meqPerL: null, isBelowDetection: false };
  if (!solute) return { ...empty, error: `“${row.key}” is no solute Tallus knows.` };
  try {
    const concentration = parseConcentration(row.value, `solutes.${row.key}.value`);
    const unit = row.unit as ConcentrationUnit;
    return {
      ...empty,
      mmolPerL: toMillimolesPerLitre(solute, concentration.value, unit),
      meqPerL: toMilliequivalentsPerLitre(solute, concentration.value, unit),
      isBelowDetection: concentration.belowDetection,
      error: null,
    };
  } catch (error) {
    if (!isChemError(error)) throw error;
    return { ...empty, error: describeChemIssue(error.toIssue()) };
  }
}
