import type { EntityManager } from '@mikro-orm/postgresql';
import { updateTeamSettingsRequestSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentUserId } from '../http/locals';
import { parseBody } from '../http/validate';
import { requireTeamRole } from '../teams/require-team-role';
import { toTeamSettingsView } from './load-team-settings';
import { TeamSettings } from './team-settings.entity';
import { updateTeamSettings } from './update-team-settings';

/** Site-data settings of a team: `GET /api/teams/:teamId/settings` (any member), `PATCH` (owner). */
export function teamSettingsRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();

  router.get('/teams/:teamId/settings', requireUser, requireTeamRole(em, 'viewer'), async (_req, res) => {
    const teamId = currentMembership(res).team.id;
    res.json(toTeamSettingsView(teamId, await em.findOne(TeamSettings, { team: teamId })));
  });

  router.patch('/teams/:teamId/settings', requireUser, requireTeamRole(em, 'owner'), async (req, res) => {
    const request = parseBody(updateTeamSettingsRequestSchema, req.body);
    res.json(await updateTeamSettings(em, { teamId: currentMembership(res).team.id, actorId: currentUserId(res), request }));
  });

  return router;
}
