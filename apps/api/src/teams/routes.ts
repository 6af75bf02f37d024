import type { EntityManager } from '@mikro-orm/postgresql';
import { createTeamRequestSchema, updateMemberRequestSchema, userSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentUser, currentUserId } from '../http/locals';
import { parseBody, parseIdParam } from '../http/validate';
import { changeMemberRole } from './change-member-role';
import { createTeam } from './create-team';
import { listMembers } from './list-members';
import { listTeams } from './list-teams';
import { removeMember } from './remove-member';
import { requireTeamRole } from './require-team-role';

/** What the team routes need. */
export interface TeamRoutesDependencies {
  em: EntityManager;
  requireUser: RequestHandler;
}

const userIdSchema = userSchema.shape.id;

/**
 * `/api/teams`: create and list teams; list members, change their roles,
 * remove them. Every `/:teamId` route answers 404 to non-members.
 */
export function teamRoutes({ em, requireUser }: TeamRoutesDependencies): Router {
  const router = Router();
  router.use(requireUser);

  router.post('/', async (req, res) => {
    res.status(201).json(await createTeam(em, currentUser(res), parseBody(createTeamRequestSchema, req.body)));
  });

  router.get('/', async (_req, res) => {
    res.json(await listTeams(em, currentUser(res)));
  });

  router.get('/:teamId', requireTeamRole(em, 'viewer'), (_req, res) => {
    const membership = currentMembership(res);
    res.json({ id: membership.team.id, name: membership.team.getEntity().name, role: membership.role });
  });

  router.get('/:teamId/members', requireTeamRole(em, 'viewer'), async (_req, res) => {
    res.json(await listMembers(em, currentMembership(res).team.id));
  });

  router.patch('/:teamId/members/:userId', requireTeamRole(em, 'owner'), async (req, res) => {
    const userId = parseIdParam(userIdSchema, req.params['userId'], 'MEMBER_NOT_FOUND');
    const { role } = parseBody(updateMemberRequestSchema, req.body);
    const teamId = currentMembership(res).team.id;
    res.json(await changeMemberRole(em, { teamId, actorId: currentUserId(res), userId, role }));
  });

  router.delete('/:teamId/members/:userId', requireTeamRole(em, 'owner'), async (req, res) => {
    const userId = parseIdParam(userIdSchema, req.params['userId'], 'MEMBER_NOT_FOUND');
    await removeMember(em, { teamId: currentMembership(res).team.id, actorId: currentUserId(res), userId });
    res.status(204).end();
  });

  return router;
}
