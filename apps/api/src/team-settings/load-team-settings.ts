import type { EntityManager } from '@mikro-orm/postgresql';
import { DEFAULT_CBE_THRESHOLD, DEFAULT_NPR_BANDS } from '@tallus/chem';
import type { TeamSettings as TeamSettingsView, TeamSettingsValues } from '@tallus/contracts';
import { TeamSettings } from './team-settings.entity';

/** Where the default charge-balance threshold comes from. */
export const CBE_THRESHOLD_SOURCE =
  '±5 %: the acceptance used in laboratory QA reports (Marshall Miller & Associates; Colorado DRMS) and the working range of Standard Methods 2320/1030E; DVWK 128/92 (as described by Wilke) asks ≤ 5 % below 2 meq/L and ≤ 2 % above with the half-sum formula.';

/** The settings of a team that never changed them. */
export const DEFAULT_TEAM_SETTINGS: TeamSettingsValues = {
  cbeThresholdPercent: DEFAULT_CBE_THRESHOLD,
  cbeConvention: 'standard',
  nprBands: { acidGenerating: DEFAULT_NPR_BANDS.acidGenerating, nonAcidGenerating: DEFAULT_NPR_BANDS.nonAcidGenerating, source: DEFAULT_NPR_BANDS.source },
  apSulfurBasis: 'sulfide',
  carbonatePathway: 'co2',
};

/** The values of a stored settings row. */
export function settingsValues(row: TeamSettings | null): TeamSettingsValues {
  if (!row) return DEFAULT_TEAM_SETTINGS;
  return {
    cbeThresholdPercent: Number(row.cbeThresholdPercent),
    cbeConvention: row.cbeConvention,
    nprBands: row.nprBands,
    apSulfurBasis: row.apSulfurBasis,
    carbonatePathway: row.carbonatePathway,
  };
}

/** The values a team computes with: its row, or the defaults. */
export async function loadTeamSettings(em: EntityManager, teamId: string): Promise<TeamSettingsValues> {
  return settingsValues(await em.findOne(TeamSettings, { team: teamId }));
}

/** The settings as `GET /api/teams/:teamId/settings` answers them. */
export function toTeamSettingsView(teamId: string, row: TeamSettings | null): TeamSettingsView {
  return {
    teamId,
    ...settingsValues(row),
    defaults: { ...DEFAULT_TEAM_SETTINGS, cbeThresholdSource: CBE_THRESHOLD_SOURCE },
    version: row?.version ?? 0,
    updatedAt: row?.updatedAt.toISOString() ?? null,
  };
}
