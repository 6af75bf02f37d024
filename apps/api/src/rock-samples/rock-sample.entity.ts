import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import type { MineralMode } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { trackedProperties } from '../db/tracked-properties';
import { Team } from '../teams/team.entity';

/**
 * One rock or waste sample of a team: sulfur forms (wt%), measured NP
 * (kg CaCO3/t), paste pH, mineral modes and an oxide analysis. ABA and CO2
 * figures are computed on read with the team's settings.
 */
export const RockSample = defineEntity({
  name: 'RockSample',
  tableName: 'rock_samples',
  properties: {
    ...baseProperties,
    ...trackedProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade'),
    name: p.string().length(160),
    site: p.string().length(200).default(''),
    depthFromM: p.double().nullable(),
    depthToM: p.double().nullable(),
    lithology: p.string().length(200).default(''),
    totalSulfurPercent: p.double().nullable(),
    sulfideSulfurPercent: p.double().nullable(),
    sulfateSulfurPercent: p.double().nullable(),
    /** Measured NP, kg CaCO3/t. */
    neutralisationPotential: p.double().nullable(),
    pastePh: p.double().nullable(),
    modes: p.json<MineralMode[]>(),
    /** Oxide wt% by libs/chem key. */
    oxides: p.json<Record<string, number>>().nullable(),
    notes: p.text().default(''),
  },
  uniques: [{ properties: ['team', 'name'] }],
  indexes: [{ properties: ['team', 'site'] }],
});

/** One rock or waste sample of a team. */
export type RockSample = InferEntity<typeof RockSample>;
