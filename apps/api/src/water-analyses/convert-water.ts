import { chargeBalance, parseConcentration, requireSolute, toMilliequivalentsPerLitre, toMillimolesPerLitre } from '@tallus/chem';
import type { ChargeBalance, ConvertedSolute, TeamSettingsValues } from '@tallus/contracts';
import { withChemPath } from '../site-data/chem-path';
import type { StoredSolute } from './water-analysis.entity';

/** What the server computes from an analysis: each solute converted and the charge balance. */
export interface WaterFigures {
  converted: Record<string, ConvertedSolute>;
  chargeBalance: ChargeBalance;
}

/**
 * Converts each solute with libs/chem (IUPAC 2021 molar masses) and computes
 * the charge balance with the team's threshold and convention.
 *
 * @param solutes as stored
 * @param pH the analysis' pH (H+ joins the cations below 4.5; low-pH note)
 * @throws ChemInputError at `solutes.<key>.value|unit` (WATER_* codes)
 */
export function computeWaterFigures(solutes: Readonly<Record<string, StoredSolute>>, pH: number | null, settings: TeamSettingsValues): WaterFigures {
  return withChemPath([], () => {
    const converted: Record<string, ConvertedSolute> = {};
    for (const [key, entry] of Object.entries(solutes)) {
      const solute = requireSolute(key, `solutes.${key}`);
      const parsed = parseConcentration(entry.value, `solutes.${key}.value`);
      const mmol = toMillimolesPerLitre(solute, parsed.value, entry.unit, `solutes.${key}.unit`);
      const meq = solute.charge === 0 ? 0 : toMilliequivalentsPerLitre(solute, parsed.value, entry.unit, `solutes.${key}.unit`);
      converted[key] = { label: solute.label, formula: solute.formula, charge: solute.charge, mmolPerL: mmol, meqPerL: meq, belowDetection: parsed.belowDetection, detectionLimit: parsed.detectionLimit };
    }
    const balance = chargeBalance({ solutes, ...(pH === null ? {} : { pH }) }, { threshold: settings.cbeThresholdPercent, convention: settings.cbeConvention });
    return {
      converted,
      chargeBalance: { ...balance, contributions: { ...balance.contributions }, notes: balance.notes.map((note) => ({ ...note })) },
    };
  });
}

/** Solutes of a request as stored: every value as text, units trimmed. */
export function toStoredSolutes(solutes: Readonly<Record<string, { value: number | string; unit: string }>>): Record<string, StoredSolute> {
  return Object.fromEntries(Object.entries(solutes).map(([key, entry]) => [key.trim(), { value: String(entry.value).trim(), unit: entry.unit.trim() }]));
}
