import { parseConcentration, requireSolute, toMillimolesPerLitre } from '@tallus/chem';
import type { MassBalanceWater } from '@tallus/contracts';
import type { WaterAnalysis } from '../water-analyses/water-analysis.entity';

/** Assumptions every stored mass-balance result states. */
export const MASS_BALANCE_ASSUMPTIONS = [
  'Waters are used in mmol per kg of water, taken equal to mmol/L: valid for dilute waters (density ≈ 1 kg/L, dissolved solids well below 1 %); saline waters and brines need a density and solids correction first.',
  'Reported units are converted to mmol/L with IUPAC 2021 abridged atomic weights (Prohaska et al. 2022); converted values are rounded to 6 significant digits, values reported in mmol/L are used exactly as written.',
  'Values below detection count 0. Fe is Fe2+ unless reported as Fe3; alkalinity counts as HCO3-; SiO2 and Si count as dissolved silica.',
  'A mass balance only says which transfers fit the analyses; it does not test whether they are thermodynamically possible or kinetically plausible (McNab 2014): check models against mineralogy, saturation and isotopes.',
] as const;

/**
 * A positive number as plain decimal text with `digits` significant digits,
 * never in exponent notation (the solver reads exact decimals).
 *
 * @example significantDecimal(0.24956, 3) // "0.250" → "0.25"
 */
export function significantDecimal(value: number, digits = 6): string {
  if (value === 0) return '0';
  const decimals = Math.min(20, Math.max(0, digits - 1 - Math.floor(Math.log10(Math.abs(value)))));
  const text = value.toFixed(decimals);
  return text.includes('.') ? text.replace(/0+$/, '').replace(/\.$/, '') : text;
}

/**
 * One water in mmol/kg for the solver: mmol/L values exactly as written,
 * other units converted with libs/chem and rounded, below detection as `<limit`.
 *
 * @param row the analysis, or null for pure water
 */
export function waterForSolver(row: WaterAnalysis | null): MassBalanceWater {
  if (!row) return { analysisId: null, name: 'pure water', mmolPerKg: {} };
  const mmolPerKg: Record<string, string> = {};
  for (const [key, entry] of Object.entries(row.solutes)) {
    const solute = requireSolute(key, `solutes.${key}`);
    const parsed = parseConcentration(entry.value);
    const exact = entry.unit === 'mmol/L' && !parsed.belowDetection ? entry.value.trim() : null;
    const amount = exact ?? significantDecimal(toMillimolesPerLitre(solute, parsed.value, entry.unit));
    mmolPerKg[key] = parsed.belowDetection ? `<${amount}` : amount;
  }
  return { analysisId: row.id, name: row.name, mmolPerKg };
}
