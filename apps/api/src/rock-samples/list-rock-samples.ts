import type { EntityManager } from '@mikro-orm/postgresql';
import type { RockSample as RockSampleView, TeamSettingsValues } from '@tallus/contracts';
import { loadTeamSettings } from '../team-settings/load-team-settings';
import { RockSample } from './rock-sample.entity';
import { toRockView } from './to-rock-view';

/**
 * The team's rock samples (optionally of one site) by site, depth and name, with their figures.
 *
 * @param settings the team's settings when the caller already has them (else loaded)
 */
export async function listRockSamples(em: EntityManager, teamId: string, site?: string, settings?: TeamSettingsValues): Promise<RockSampleView[]> {
  const rows = await em.find(RockSample, { team: teamId, ...(site === undefined ? {} : { site }) }, { orderBy: { site: 'asc', depthFromM: 'asc', name: 'asc' } });
  const teamSettings = settings ?? (await loadTeamSettings(em, teamId));
  return rows.map((row) => toRockView(row, teamSettings));
}
