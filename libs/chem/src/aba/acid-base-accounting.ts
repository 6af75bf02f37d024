/**
 * Acid-base accounting (ABA) of mine waste, in kg CaCO3 per tonne: AP from sulfur, NNP, NPR and
 * a screening class with bands the caller may set.
 */
import { ChemError } from '../errors/chem-error';

/** AP factor, kg CaCO3/t per wt% S: 1 mol FeS2 (2 S) makes 4 H+, neutralised by 2 CaCO3 to CO2 (Sobek et al. 1978; 100/32 rounded). */
export const AP_FACTOR = 31.25;
/** AP factor when neutralisation stops at HCO3- (1 H+ per CaCO3), as Dold (2017) argues. */
export const AP_FACTOR_BICARBONATE = 62.5;

/** NPR bands: below `acidGenerating` PAG, above `nonAcidGenerating` non-acid generating, between uncertain. */
export interface NprBands {
  readonly acidGenerating: number;
  readonly nonAcidGenerating: number;
  readonly source: string;
}

/**
 * Default NPR screening bands: < 1 PAG, 1–3 uncertain, > 3 non-acid generating.
 */
export const DEFAULT_NPR_BANDS: NprBands = {
  acidGenerating: 1,
  nonAcidGenerating: 3,
  source:
    'Price (2009) MEND Report 1.20.1 as summarised by the GTK Mine Closure wiki; the same 1/3 bands in Nevada NDEP practice (Itasca report to Colorado DRMS). The MEND text itself may give 2 as the upper bound (recalled from memory): set the bands your jurisdiction requires.',
};

/** The screening classes. */
export type AbaClass = 'potentially-acid-generating' | 'uncertain' | 'non-acid-generating';

/** Input of {@link acidBaseAccounting}. */
export interface AbaInput {
  /** Sulfide sulfur, wt%. */
  readonly sulfideSulfurPercent?: number;
  /** Total sulfur, wt%: used only without sulfide S, with a warning. */
  readonly totalSulfurPercent?: number;
  /** Neutralisation potential, kg CaCO3/t. */
  readonly neutralisationPotential: number;
  /** AP factor, default 31.25 (62.5 for the bicarbonate end point). */
  readonly apFactor?: number;
  readonly bands?: Omit<NprBands, 'source'> & { readonly source?: string };
}

/** A caution or warning of an ABA result. */
export interface AbaNote {
  readonly code: 'TOTAL_SULFUR' | 'NO_ACID_POTENTIAL' | 'SCREENING_ONLY';
  readonly message: string;
}

/** Words shown with every ABA result (API, client, report). */
export const ABA_NOTES = {
  TOTAL_SULFUR: 'AP from total sulfur counts sulfate and organic sulfur as if it were sulfide, and so overstates the acid potential (Basu 2010).',
  NO_ACID_POTENTIAL: 'AP is 0: NPR is undefined (infinite); the sample is classed non-acid generating on the absence of sulfide.',
  SCREENING_ONLY:
    'Screening estimate only: static ABA gives no rates and needs kinetic confirmation; classification bands are simplifications; defer to local regulations and a licensed professional.',
} as const;

/** Result of {@link acidBaseAccounting}; figures in kg CaCO3/t. */
export interface AbaResult {
  readonly acidPotential: number;
  readonly neutralisationPotential: number;
  readonly netNeutralisationPotential: number;
  /** NP/AP; `null` when AP is 0 (undefined, infinite for NP > 0). */
  readonly neutralisationPotentialRatio: number | null;
  readonly classification: AbaClass;
  readonly bands: NprBands;
  readonly notes: readonly AbaNote[];
}

function checkNumber(value: number | undefined, field: string, max = Number.POSITIVE_INFINITY): void {
  if (value === undefined || (typeof value === 'number' && Number.isFinite(value) && value >= 0 && value <= max)) return;
  const text = String(value);
  throw new ChemError('ABA_BAD_INPUT', `${field} must be a number from 0 to ${max}.`, { start: 0, end: text.length }, { field });
}

function checkInput(input: AbaInput): void {
  checkNumber(input.sulfideSulfurPercent, 'sulfideSulfurPercent', 100);
  checkNumber(input.totalSulfurPercent, 'totalSulfurPercent', 100);
  checkNumber(input.neutralisationPotential, 'neutralisationPotential');
  checkNumber(input.apFactor, 'apFactor');
  if (input.neutralisationPotential === undefined) checkNumber(Number.NaN, 'neutralisationPotential');
  if (input.sulfideSulfurPercent === undefined && input.totalSulfurPercent === undefined) {
    throw new ChemError('ABA_BAD_INPUT', 'Give sulfide sulfur (or total sulfur).', { start: 0, end: 0 }, { field: 'sulfideSulfurPercent' });
  }
  const bands = input.bands;
  if (bands !== undefined && !(bands.acidGenerating > 0 && bands.nonAcidGenerating >= bands.acidGenerating)) {
    throw new ChemError('ABA_BAD_INPUT', 'Bands need 0 < acidGenerating ≤ nonAcidGenerating.', { start: 0, end: 0 }, { field: 'bands' });
  }
}

/**
 * Classifies an NPR against bands: < acidGenerating PAG, > nonAcidGenerating non-acid generating.
 * `null` (AP = 0) is non-acid generating.
 * @example classifyNpr(2); // "uncertain"
 */
export function classifyNpr(npr: number | null, bands: Omit<NprBands, 'source'> = DEFAULT_NPR_BANDS): AbaClass {
  if (npr === null || npr > bands.nonAcidGenerating) return 'non-acid-generating';
  return npr < bands.acidGenerating ? 'potentially-acid-generating' : 'uncertain';
}

/**
 * AP = factor × S (wt%), NNP = NP − AP, NPR = NP/AP, and the screening class.
 * @throws ChemError ABA_BAD_INPUT (details.field)
 * @example acidBaseAccounting({ sulfideSulfurPercent: 1, neutralisationPotential: 20 }).classification;
 * // "potentially-acid-generating" (AP 31.25, NPR 0.64)
 */
export function acidBaseAccounting(input: AbaInput): AbaResult {
  checkInput(input);
  const notes: AbaNote[] = [];
  const sulfur = input.sulfideSulfurPercent ?? input.totalSulfurPercent ?? 0;
  if (input.sulfideSulfurPercent === undefined) notes.push({ code: 'TOTAL_SULFUR', message: ABA_NOTES.TOTAL_SULFUR });
  const ap = (input.apFactor ?? AP_FACTOR) * sulfur;
  const np = input.neutralisationPotential;
  const npr = ap === 0 ? null : np / ap;
  if (ap === 0) notes.push({ code: 'NO_ACID_POTENTIAL', message: ABA_NOTES.NO_ACID_POTENTIAL });
  notes.push({ code: 'SCREENING_ONLY', message: ABA_NOTES.SCREENING_ONLY });
  const bands: NprBands = input.bands === undefined ? DEFAULT_NPR_BANDS : { source: 'set by the caller', ...input.bands };
  return {
    acidPotential: ap,
    neutralisationPotential: np,
    netNeutralisationPotential: np - ap,
    neutralisationPotentialRatio: npr,
    classification: classifyNpr(npr, bands),
    bands,
    notes,
  };
}
