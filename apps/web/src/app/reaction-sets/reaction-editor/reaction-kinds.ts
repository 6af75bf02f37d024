import type { ReactionKind } from '@tallus/contracts';

/** Screen words of the reaction kinds (DESIGN.md §2), in the order the kind menu lists them. */
export const REACTION_KIND_LABELS: readonly { kind: ReactionKind; label: string }[] = [
  { kind: 'dissolution', label: 'dissolution' },
  { kind: 'alteration', label: 'alteration' },
  { kind: 'oxidation', label: 'oxidation' },
  { kind: 'precipitation', label: 'precipitation' },
  { kind: 'gas_exchange', label: 'gas exchange' },
  { kind: 'half_reaction', label: 'half-reaction' },
];

/**
 * The screen word of a reaction kind.
 *
 * @param kind a kind from the API
 */
export function reactionKindLabel(kind: ReactionKind): string {
  return REACTION_KIND_LABELS.find((entry) => entry.kind === kind)?.label ?? kind;
}
