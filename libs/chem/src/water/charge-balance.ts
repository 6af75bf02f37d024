/**
 * Charge-balance error (CBE) of a water analysis, in meq/L.
 */
import { ChemError } from '../errors/chem-error';
import { parseConcentration, toMilliequivalentsPerLitre } from './concentration';
import { requireSolute } from './solutes';

/** One reported solute: a number or text such as `"<0.01"`, and its unit. */
export interface SoluteValue {
  readonly value: number | string;
  readonly unit: string;
}

/** A water analysis: solutes by key (see `SOLUTES`), and pH when measured. */
export interface WaterAnalysis {
  readonly solutes: Readonly<Record<string, SoluteValue>>;
  readonly pH?: number;
}

/**
 * `standard`: CBE = (Σcations − Σanions)/(Σcations + Σanions) × 100 (Freeze & Cherry; lab QA
 * reports). `half-sum`: the denominator is (Σcations + Σanions)/2, which doubles the figure
 * (DVWK 128/92, as described by Wilke).
 */
export type ChargeBalanceConvention = 'standard' | 'half-sum';

/** Options of {@link chargeBalance}. */
export interface ChargeBalanceOptions {
  /** |CBE| in % above which the analysis is flagged; default per convention (see README). */
  readonly threshold?: number;
  readonly convention?: ChargeBalanceConvention;
  /**
   * H+ from pH as a cation, 1000·10^(−pH) meq/L: `below-4.5` (default) adds it only when
   * pH < 4.5, where it is no longer negligible; `always`; `never`.
   */
  readonly protons?: 'below-4.5' | 'always' | 'never';
}

/** A note on the reliability of a charge balance. */
export interface ChargeBalanceNote {
  readonly code: 'LOW_PH' | 'DILUTE' | 'BELOW_DETECTION' | 'NO_IONS';
  readonly message: string;
}

/** The outcome of {@link chargeBalance}; sums in meq/L. */
export interface ChargeBalanceResult {
  readonly cationsMeq: number;
  readonly anionsMeq: number;
  /** H+ from pH included in `cationsMeq` (0 when not included). */
  readonly protonsMeq: number;
  /** Signed CBE in %; `null` when there are no ions. */
  readonly cbePercent: number | null;
  readonly convention: ChargeBalanceConvention;
  readonly threshold: number;
  /** Whether |CBE| exceeds the threshold. */
  readonly flagged: boolean;
  /** meq/L of each charged solute, signed (anions negative). */
  readonly contributions: Readonly<Record<string, number>>;
  readonly notes: readonly ChargeBalanceNote[];
}

/** The words of the charge-balance notes, shared by API, client and report. */
export const CHARGE_BALANCE_NOTES = {
  LOW_PH:
    'pH is below 4.5: H+ and the speciation of Fe, Al and sulfate (HSO4-, AlSO4+, Al hydroxo complexes) change the charge each ion carries, so a CBE from free-ion charges is only indicative.',
  DILUTE:
    'Dilute water (Σ cations + Σ anions below 1 meq/L): small absolute errors give large percentages; judge the absolute difference as well.',
  BELOW_DETECTION: 'Solutes below detection count as 0 in the sums: ',
  NO_IONS: 'No charged solutes: no charge balance.',
} as const;

/** Default |CBE| threshold, 5 %: the acceptance used in laboratory QA reports (Marshall Miller & Associates; Colorado DRMS). */
export const DEFAULT_CBE_THRESHOLD = 5;

interface Sums {
  cations: number;
  anions: number;
  contributions: Record<string, number>;
  belowDetection: string[];
}

function sumIons(analysis: WaterAnalysis): Sums {
  const sums: Sums = { cations: 0, anions: 0, contributions: {}, belowDetection: [] };
  if (analysis.solutes.HCO3 !== undefined && analysis.solutes.alkalinity !== undefined) {
    throw new ChemError('WATER_DUPLICATE_SOLUTE', 'Give bicarbonate as HCO3 or as alkalinity, not both.', { start: 0, end: 10 }, { field: 'solutes.alkalinity' });
  }
  for (const [key, entry] of Object.entries(analysis.solutes)) {
    const solute = requireSolute(key, `solutes.${key}`);
    const parsed = parseConcentration(entry.value, `solutes.${key}.value`);
    if (parsed.belowDetection) sums.belowDetection.push(key);
    if (!solute.inChargeBalance) continue;
    const meq = parsed.belowDetection ? 0 : toMilliequivalentsPerLitre(solute, parsed.value, entry.unit, `solutes.${key}.unit`);
    if (solute.charge > 0) sums.cations += meq;
    else sums.anions += meq;
    sums.contributions[key] = solute.charge > 0 ? meq : -meq;
  }
  return sums;
}

function protonsMeq(pH: number | undefined, mode: ChargeBalanceOptions['protons']): number {
  if (pH === undefined || mode === 'never') return 0;
  if (!Number.isFinite(pH)) throw new ChemError('WATER_BAD_VALUE', 'pH must be a number.', { start: 0, end: 0 }, { field: 'pH' });
  if (mode === 'always' || pH < 4.5) return 1000 * 10 ** -pH;
  return 0;
}

function defaultThreshold(convention: ChargeBalanceConvention, cations: number, anions: number): number {
  // DVWK 128/92: ≤ 5 % when both sums are ≤ 2 meq/L, otherwise ≤ 2 % (half-sum formula).
  if (convention === 'half-sum') return cations <= 2 && anions <= 2 ? 5 : 2;
  return DEFAULT_CBE_THRESHOLD;
}

function notesFor(pH: number | undefined, total: number, belowDetection: readonly string[]): ChargeBalanceNote[] {
  const notes: ChargeBalanceNote[] = [];
  if (total === 0) notes.push({ code: 'NO_IONS', message: CHARGE_BALANCE_NOTES.NO_IONS });
  if (pH !== undefined && pH < 4.5) notes.push({ code: 'LOW_PH', message: CHARGE_BALANCE_NOTES.LOW_PH });
  if (total > 0 && total < 1) notes.push({ code: 'DILUTE', message: CHARGE_BALANCE_NOTES.DILUTE });
  if (belowDetection.length > 0) notes.push({ code: 'BELOW_DETECTION', message: `${CHARGE_BALANCE_NOTES.BELOW_DETECTION}${belowDetection.join(', ')}.` });
  return notes;
}

/**
 * Charge-balance error of a water analysis, in meq/L, with notes on low pH, dilute waters and
 * values below detection (counted as 0).
 * @throws ChemError WATER_UNKNOWN_SOLUTE, WATER_BAD_VALUE, WATER_BAD_UNIT, WATER_DUPLICATE_SOLUTE
 *   (details.field names the field, e.g. `solutes.Ca.unit`)
 * @example
 * chargeBalance({ solutes: { Na: { value: 1, unit: 'mmol/L' }, Cl: { value: 0.9, unit: 'mmol/L' } } }).cbePercent;
 * // ≈ 5.263 (flagged: true)
 */
export function chargeBalance(analysis: WaterAnalysis, options: ChargeBalanceOptions = {}): ChargeBalanceResult {
  const convention = options.convention ?? 'standard';
  const sums = sumIons(analysis);
  const protons = protonsMeq(analysis.pH, options.protons ?? 'below-4.5');
  const cations = sums.cations + protons;
  const total = cations + sums.anions;
  const denominator = convention === 'half-sum' ? total / 2 : total;
  const cbePercent = total === 0 ? null : ((cations - sums.anions) / denominator) * 100;
  const threshold = options.threshold ?? defaultThreshold(convention, cations, sums.anions);
  if (!Number.isFinite(threshold) || threshold < 0) {
    throw new ChemError('WATER_BAD_VALUE', 'The threshold is a non-negative percentage.', { start: 0, end: 0 }, { field: 'threshold' });
  }
  return {
    cationsMeq: cations,
    anionsMeq: sums.anions,
    protonsMeq: protons,
    cbePercent,
    convention,
    threshold,
    flagged: cbePercent !== null && Math.abs(cbePercent) > threshold,
    contributions: sums.contributions,
    notes: notesFor(analysis.pH, total, sums.belowDetection),
  };
}
