import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { baseProperties } from '../db/base-properties';
import { trackedProperties } from '../db/tracked-properties';
import { Team } from '../teams/team.entity';

/** A solute as reported: the value as text (`"12.5"`, `"<0.01"`: below detection is never stored as 0) and its unit. */
export interface StoredSolute {
  value: string;
  unit: string;
}

/**
 * One water sample of a team: solutes with their units as reported, pH,
 * temperature, site, date. Conversions and the charge balance are computed on
 * read with libs/chem, since the team's threshold may change.
 */
export const WaterAnalysis = defineEntity({
  name: 'WaterAnalysis',
  tableName: 'water_analyses',
  properties: {
    ...baseProperties,
    ...trackedProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade'),
    name: p.string().length(160),
    site: p.string().length(200).default(''),
    /** `YYYY-MM-DD`, or null when not known. */
    sampledOn: p.string().length(10).nullable(),
    temperatureC: p.double().nullable(),
    ph: p.double().nullable(),
    solutes: p.json<Record<string, StoredSolute>>(),
    notes: p.text().default(''),
  },
  uniques: [{ properties: ['team', 'name'] }],
  indexes: [{ properties: ['team', 'site'] }],
});

/** One water sample of a team. */
export type WaterAnalysis = InferEntity<typeof WaterAnalysis>;
