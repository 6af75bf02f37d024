import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { MassBalanceModel as MassBalanceModelView, MassBalanceResultView } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { trackedProperties } from '../db/tracked-properties';
import { Team } from '../teams/team.entity';
import { WaterAnalysis } from '../water-analyses/water-analysis.entity';

/** A candidate phase as stored: the formula a species id resolved to is kept beside the id. */
export type StoredPhase = MassBalanceModelView['phases'][number];

/**
 * An inverse mass-balance model: an initial water (null: pure water) and a
 * final water of the team, candidate phases, constraints and uncertainty, with
 * the result libs/chem computed when it was last saved or solved. A water
 * used by a model cannot be deleted (restrict).
 */
export const MassBalanceModel = defineEntity({
  name: 'MassBalanceModel',
  tableName: 'mass_balance_models',
  properties: {
    ...baseProperties,
    ...trackedProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade'),
    name: p.string().length(200),
    description: p.text().default(''),
    initialWater: () => p.manyToOne(WaterAnalysis).ref().nullable().deleteRule('restrict'),
    finalWater: () => p.manyToOne(WaterAnalysis).ref().deleteRule('restrict'),
    phases: p.json<StoredPhase[]>(),
    constraints: p.json<string[]>(),
    uncertainty: p.json<Record<string, number>>(),
    result: p.json<MassBalanceResultView>(),
  },
  indexes: [{ properties: ['team', 'name'] }],
});

/** An inverse mass-balance model with its stored result. */
export type MassBalanceModel = InferEntity<typeof MassBalanceModel>;
