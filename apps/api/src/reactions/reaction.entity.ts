import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { BALANCE_STATUSES, REACTION_KINDS, type ReactionResult } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { trackedProperties } from '../db/tracked-properties';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';

/** How the result was reached, and what else balancing said (the parts of {@link ReactionResult} without a column of their own). */
export type ReactionBalanceDetails = Pick<ReactionResult, 'mode' | 'balancedEquation' | 'freedom' | 'missing' | 'balances' | 'warnings' | 'error'>;

/**
 * A reaction of a set, with the results libs/chem computed when it was last
 * saved (status, residuals, proton and electron budgets). Lists read these;
 * nothing is recomputed on read.
 */
export const Reaction = defineEntity({
  name: 'Reaction',
  tableName: 'reactions',
  properties: {
    ...baseProperties,
    ...trackedProperties,
    set: () => p.manyToOne(ReactionSet).ref().deleteRule('cascade'),
    position: p.integer(),
    name: p.string().length(200),
    kind: p.enum([...REACTION_KINDS]),
    equation: p.text(),
    /** Species the budgets are normalised to; null: the first left-hand species. */
    reference: p.string().length(200).nullable(),
    citation: p.text().default(''),
    notes: p.text().default(''),
    status: p.enum([...BALANCE_STATUSES]),
    residuals: p.json<ReactionResult['residuals']>(),
    protonBudget: p.json<NonNullable<ReactionResult['protonBudget']>>().nullable(),
    electronBudget: p.json<NonNullable<ReactionResult['electrons']>>().nullable(),
    balance: p.json<ReactionBalanceDetails>(),
  },
  indexes: [{ properties: ['set', 'position'] }],
});

/** A reaction of a set with its stored results. */
export type Reaction = InferEntity<typeof Reaction>;
