import { ref } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { TeamSettings as TeamSettingsView, UpdateTeamSettingsRequest } from '@tallus/contracts';
import { recordAudit } from '../audit/record-audit';
import { assertVersion } from '../db/assert-version';
import { Team } from '../teams/team.entity';
import { DEFAULT_TEAM_SETTINGS, toTeamSettingsView } from './load-team-settings';
import { TeamSettings } from './team-settings.entity';

/** Who changes which team's settings. */
export interface UpdateTeamSettingsInput {
  teamId: string;
  actorId: string;
  request: UpdateTeamSettingsRequest;
}

/**
 * Changes a team's settings; the first change writes the row (version 0 → 1).
 *
 * @throws ConflictError VERSION_CONFLICT when `version` is not the current one (0 before the first save)
 */
export async function updateTeamSettings(em: EntityManager, input: UpdateTeamSettingsInput): Promise<TeamSettingsView> {
  const { version, ...changes } = input.request;
  return em.transactional(async (tx) => {
    let row = await tx.findOne(TeamSettings, { team: input.teamId }, { refresh: true });
    assertVersion(row?.version ?? 0, version);
    if (!row) row = tx.create(TeamSettings, { team: ref(tx.getReference(Team, input.teamId)), ...DEFAULT_TEAM_SETTINGS, ...changes });
    else Object.assign(row, Object.fromEntries(Object.entries(changes).filter(([, value]) => value !== undefined)));
    const summary = Object.keys(changes).join(', ') || 'nothing';
    recordAudit(tx, { teamId: input.teamId, actorId: input.actorId, action: 'team_settings.updated', entityType: 'team_settings', entityId: input.teamId, summary: `Changed site-data settings: ${summary}` });
    await tx.flush();
    return toTeamSettingsView(input.teamId, row);
  });
}
