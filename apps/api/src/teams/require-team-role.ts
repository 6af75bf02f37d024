import type { EntityManager } from '@mikro-orm/postgresql';
import { hasRole, teamIdSchema, type Role } from '@tallus/contracts';
import type { RequestHandler } from 'express';
import { ForbiddenError, NotFoundError } from '../errors/app-errors';
import { currentUserId } from '../http/locals';
import { parseIdParam } from '../http/validate';
import { Membership } from './membership.entity';

/**
 * Middleware for every `/teams/:teamId/...` route: loads the caller's
 * membership of the team (with the team) into `res.locals.membership`.
 * Must follow `requireUser`.
 *
 * @param em request-scoped EntityManager
 * @param required the weakest role allowed
 * @throws NotFoundError TEAM_NOT_FOUND when the caller is not a member, the team does not exist, or the id is malformed:
 *   an outsider cannot tell these apart
 * @throws ForbiddenError TEAM_ROLE_REQUIRED when the caller is a member with a weaker role
 */
export function requireTeamRole(em: EntityManager, required: Role): RequestHandler {
  return async (req, res, next) => {
    const teamId = parseIdParam(teamIdSchema, req.params['teamId'], 'TEAM_NOT_FOUND');
    const membership = await em.findOne(Membership, { team: teamId, user: currentUserId(res) }, { populate: ['team'] });
    if (!membership) throw new NotFoundError('TEAM_NOT_FOUND', 'No such team, or you are not a member of it.');
    if (!hasRole(membership.role, required)) {
      throw new ForbiddenError('TEAM_ROLE_REQUIRED', `This needs the ${required} role in the team; you are ${membership.role}.`);
    }
    res.locals.membership = membership;
    next();
  };
}
