import { defineEntity, p, type InferEntity } from '@mikro-orm/core';
import { AP_SULFUR_BASES, CARBONATE_PATHWAYS, CBE_CONVENTIONS, type NprBandsSetting } from '@tallus/contracts';
import { baseProperties } from '../db/base-properties';
import { trackedProperties } from '../db/tracked-properties';
import { Team } from '../teams/team.entity';

/**
 * A team's choices for site data: the charge-balance threshold and convention
 * of water analyses, the NPR bands, the sulfur AP is computed from and the
 * carbonate end point. One row per team, written the first time an owner
 * changes a default.
 */
export const TeamSettings = defineEntity({
  name: 'TeamSettings',
  tableName: 'team_settings',
  properties: {
    ...baseProperties,
    ...trackedProperties,
    team: () => p.manyToOne(Team).ref().deleteRule('cascade').unique(),
    /** |CBE| in % above which an analysis is flagged. */
    cbeThresholdPercent: p.double(),
    cbeConvention: p.enum([...CBE_CONVENTIONS]),
    nprBands: p.json<NprBandsSetting>(),
    apSulfurBasis: p.enum([...AP_SULFUR_BASES]),
    carbonatePathway: p.enum([...CARBONATE_PATHWAYS]),
  },
});

/** A team's settings for site data. */
export type TeamSettings = InferEntity<typeof TeamSettings>;
