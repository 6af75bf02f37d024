import type { NetReaction, Reaction } from '@tallus/contracts';

/** One bar of the proton budget chart. */
export interface ProtonBar {
  label: string;
  /** mol H+ per mol of the reference species (+ produced, − consumed). */
  value: number;
  /** The exact value as text, for the table. */
  exact: string;
  reference: string;
  isNet: boolean;
}

/**
 * The bars of a set's proton budget chart: each reaction with a budget, in set order, then each
 * net reaction that combined. Reactions without a budget (invalid, open) are left out and counted.
 *
 * @param reactions the set's reactions in order
 * @param netReactions the set's net reactions
 */
export function protonBars(reactions: readonly Reaction[], netReactions: readonly NetReaction[]): { bars: ProtonBar[]; skipped: number } {
  const bars: ProtonBar[] = [];
  let skipped = 0;
  for (const reaction of reactions) {
    const budget = reaction.result.protonBudget;
    if (!budget || reaction.result.status !== 'balanced') {
      skipped++;
      continue;
    }
    bars.push({ label: reaction.name, value: rationalValue(budget.perMole), exact: budget.perMole, reference: budget.reference, isNet: false });
  }
  for (const net of netReactions) {
    const budget = net.result.protonBudget;
    if (budget) bars.push({ label: `Net: ${net.name}`, value: rationalValue(budget.perMole), exact: budget.perMole, reference: budget.reference, isNet: true });
  }
  return { bars, skipped };
}

/**
 * The value of an exact rational text (`"-15/4"`, `"2"`, `"0.5"`) as a number, for plotting.
 *
 * @param text a rational as the API sends it
 */
export function rationalValue(text: string): number {
  const [numerator, denominator] = text.split('/');
  const value = Number(numerator) / (denominator === undefined ? 1 : Number(denominator));
  return Number.isFinite(value) ? value : 0;
}
