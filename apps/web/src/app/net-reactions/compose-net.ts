import { combineReactions, formatFormula, parseEquation, speciesKey, type ChemIssue, type OxidationStateMap } from '@tallus/chem';

import { CheckView, checkReaction } from '../reactions/reaction-check/check-reaction';

/** A reaction picked for a net reaction, with an optional fixed multiplier (`"1/4"`). */
export interface PickedReaction {
  id: string;
  equation: string;
  multiplier: string;
}

/** The net reaction as computed in the browser. */
export interface NetView {
  status: 'combined' | 'none' | 'several' | 'invalid' | 'empty';
  /** Per picked reaction, the exact multiplier (`null` where not determined). */
  multipliers: (string | null)[];
  equation: string | null;
  /** The check of the combined equation (its budgets), when combined. */
  check: CheckView | null;
  freedom: number;
  error: (ChemIssue & { reaction?: number }) | null;
  warnings: string[];
}

/**
 * The species of some reactions, once each (species identity: composition and charge), in
 * canonical text, for the "cancel" choice.
 *
 * @param equations equation texts; ones that do not parse are skipped
 */
export function speciesOf(equations: readonly string[]): string[] {
  const seen = new Map<string, string>();
  for (const text of equations) {
    try {
      for (const term of parseEquation(text).terms) {
        const key = speciesKey(term.formula);
        if (!seen.has(key)) seen.set(key, formatFormula(term.formula));
      }
    } catch {
      // A reaction that does not parse offers no species; the list shows the others.
    }
  }
  return [...seen.values()];
}

/**
 * Combines reactions with libs/chem so that the species to cancel cancel, with exact
 * multipliers, and checks the net equation (its proton budget per mole of its first species).
 *
 * @param picked the reactions, in order, with optional fixed multipliers
 * @param cancel formulas of the intermediates to cancel
 * @param oxidationStates explicit oxidation states of the team's catalogue, for the electron budget
 */
export function composeNet(picked: readonly PickedReaction[], cancel: readonly string[], oxidationStates?: OxidationStateMap): NetView {
  if (picked.length === 0) {
    return { status: 'empty', multipliers: [], equation: null, check: null, freedom: 0, error: null, warnings: [] };
  }
  const result = combineReactions({
    reactions: picked.map((reaction) => ({
      equation: reaction.equation,
      ...(reaction.multiplier.trim() ? { multiplier: reaction.multiplier.trim() } : {}),
    })),
    cancel,
  });
  return {
    status: result.status,
    multipliers: result.multipliers.map((multiplier) => multiplier?.toString() ?? null),
    equation: result.equation,
    check: result.status === 'combined' && result.equation ? checkReaction({ equation: result.equation, oxidationStates }) : null,
    freedom: result.freedom,
    error: result.error ?? null,
    warnings: result.warnings.map((warning) => warning.message),
  };
}
