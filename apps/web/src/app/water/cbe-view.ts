/** The charge balance of an analysis as the screen shows it: an icon, a word and what it means. */
export interface CbeView {
  label: string;
  icon: string;
  tone: 'success' | 'danger' | 'info';
  meaning: string;
}

/** Short words for the charge-balance notes (the full texts are libs/chem's `CHARGE_BALANCE_NOTES`). */
export const CBE_NOTE_WORDS: Readonly<Partial<Record<string, string>>> = {
  LOW_PH: 'pH below 4.5',
  DILUTE: 'very dilute',
  BELOW_DETECTION: 'below detection',
  NO_IONS: 'no ions',
};

/**
 * The flag of a charge balance error: within or beyond the team's threshold, or not computable.
 *
 * @param balance `cbePercent` (signed %, null without charged solutes), `threshold` (%), `flagged`
 * @example cbeView({ cbePercent: 7.2, threshold: 5, flagged: true }).label; // "over ±5 %"
 */
export function cbeView(balance: { cbePercent: number | null; threshold: number; flagged: boolean }): CbeView {
  const limit = `±${formatThreshold(balance.threshold)} %`;
  if (balance.cbePercent === null) {
    return { label: 'no CBE', icon: 'help', tone: 'info', meaning: 'No charged solutes reported: the charge balance cannot be computed.' };
  }
  if (balance.flagged) {
    const excess = balance.cbePercent > 0 ? 'cations exceed anions' : 'anions exceed cations';
    return { label: `over ${limit}`, icon: 'flag', tone: 'danger', meaning: `The charge balance error is beyond the team’s ${limit}: ${excess}. Check for a missing solute, a unit or a transcription error before using this analysis.` };
  }
  return { label: `within ${limit}`, icon: 'check_circle', tone: 'success', meaning: `The charge balance error lies within the team’s ${limit}.` };
}

function formatThreshold(value: number): string {
  return Number.isInteger(value) ? String(value) : value.toFixed(1);
}
