import { checkEquation, checkToJson, combineReactions, combineToJson, type OxidationStateMap } from '@tallus/chem';
import type { NetReactionResult } from '@tallus/contracts';
import type { StoredNetMember } from './net-reaction.entity';

/** A member reaction's text as the net reaction uses it. */
export interface MemberEquation {
  /** The reaction's balanced text when it has one, else its text as written. */
  equation: string;
}

/** What a net reaction's result depends on. */
export interface NetReactionInput {
  members: readonly StoredNetMember[];
  /** Equations of the set's reactions by id; members whose reaction is gone are left out. */
  equations: ReadonlyMap<string, MemberEquation>;
  cancel: readonly string[];
  oxidationStates: OxidationStateMap;
}

/**
 * Combines the member reactions with libs/chem so that the `cancel` species
 * cancel, and checks the net equation for its proton and electron budgets
 * (per mole of its first left-hand species).
 *
 * @example pyrite → Fe2+ (R15) with Fe2+ → Fe(OH)3 (R20), cancelling Fe^2+:
 *   equation 'FeS2 + 15/4 O2 + 7/2 H2O -> Fe(OH)3 + 2 SO4^2- + 4 H+', protonBudget.perMole '4'
 */
export function computeNetResult(input: NetReactionInput): NetReactionResult {
  const reactions = input.members.flatMap((member) => {
    const found = input.equations.get(member.reactionId);
    return found ? [{ equation: found.equation, ...(member.multiplier ? { multiplier: member.multiplier } : {}) }] : [];
  });
  const json = combineToJson(combineReactions({ reactions, cancel: [...input.cancel] }));
  const combined = { ...json, multipliers: [...json.multipliers], terms: [...json.terms], warnings: [...json.warnings] };
  if (combined.status !== 'combined' || combined.equation === null) return { ...combined, protonBudget: null, electrons: null };
  const check = checkToJson(checkEquation(combined.equation, { oxidationStates: input.oxidationStates }));
  const electrons =
    check.electronsTransferred === null || check.o2Demand === null
      ? null
      : { byElement: check.electrons, transferred: check.electronsTransferred, o2Demand: check.o2Demand };
  return { ...combined, protonBudget: check.protonBudget, electrons };
}
