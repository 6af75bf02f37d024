import type { Reaction as ReactionView, ReactionResult } from '@tallus/contracts';
import type { Reaction } from './reaction.entity';

/** A reaction with its stored results, as responses show it; nothing is recomputed. */
export function toReactionView(reaction: Reaction): ReactionView {
  return {
    id: reaction.id,
    setId: reaction.set.id,
    position: reaction.position,
    name: reaction.name,
    kind: reaction.kind,
    equation: reaction.equation,
    reference: reaction.reference ?? null,
    citation: reaction.citation,
    notes: reaction.notes,
    result: {
      status: reaction.status,
      ...reaction.balance,
      residuals: reaction.residuals,
      electrons: reaction.electronBudget ?? null,
      protonBudget: reaction.protonBudget ?? null,
    },
    version: reaction.version,
    updatedAt: reaction.updatedAt.toISOString(),
  };
}

/** The columns of a reaction that hold a computed result. */
export function toResultColumns(result: ReactionResult): Pick<Reaction, 'status' | 'residuals' | 'protonBudget' | 'electronBudget' | 'balance'> {
  const { status, residuals, protonBudget, electrons, ...balance } = result;
  return { status, residuals, protonBudget, electronBudget: electrons, balance };
}
