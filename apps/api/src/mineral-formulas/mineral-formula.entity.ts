import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { FormulaRecalculationView, OxideAnalysisRequest } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { ReactionSet } from '../reaction-sets/reaction-set.entity';
import { Reaction } from '../reactions/reaction.entity';
import { Species } from '../species/species.entity';
import { Team } from '../teams/team.entity';
import { User } from '../users/user.entity';

/**
 * The provenance of a species made from an oxide analysis: the analysis, the
 * basis and method of the recalculation, its result, who saved it and when,
 * and the weathering reaction added to a set. Never edited: a new analysis is
 * a new record.
 */
export const MineralFormula = defineEntity({
  name: 'MineralFormula',
  tableName: 'mineral_formulas',
  properties: {
    ...baseProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade'),
    species: () => p.manyToOne(Species).ref().nullable().deleteRule('set null'),
    name: p.string().length(160),
    sampleName: p.string().length(200).default(''),
    analysis: p.json<OxideAnalysisRequest>(),
    basis: p.string().length(200),
    method: p.string().length(400),
    result: p.json<FormulaRecalculationView>(),
    reaction: () => p.manyToOne(Reaction).ref().nullable().deleteRule('set null'),
    reactionSet: () => p.manyToOne(ReactionSet).ref().nullable().deleteRule('set null'),
    notes: p.text().default(''),
    createdBy: () => p.manyToOne(User).ref().nullable().deleteRule('set null'),
  },
  indexes: [{ properties: ['team', 'createdAt'] }],
});

/** The provenance of a species made from an oxide analysis. */
export type MineralFormula = InferEntity<typeof MineralFormula>;
