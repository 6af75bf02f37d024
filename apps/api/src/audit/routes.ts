import type { EntityManager } from '@mikro-orm/postgresql';
import { activityQuerySchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership } from '../http/locals';
import { parseBody } from '../http/validate';
import { requireTeamRole } from '../teams/require-team-role';
import { listActivity } from './list-activity';

/** `/api/teams/:teamId/activity` (any member): the team's recent audit events. */
export function activityRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router({ mergeParams: true });
  router.get('/', requireUser, requireTeamRole(em, 'viewer'), async (req, res) => {
    const { limit } = parseBody(activityQuerySchema, req.query);
    res.json(await listActivity(em, currentMembership(res).team.id, limit));
  });
  return router;
}
