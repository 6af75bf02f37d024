import type { EntityManager } from '@mikro-orm/postgresql';
import { acceptInvitationRequestSchema, createInvitationRequestSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentUser } from '../http/locals';
import { parseBody } from '../http/validate';
import type { Mailer } from '../mail/mailer';
import { requireTeamRole } from '../teams/require-team-role';
import { acceptInvitation } from './accept-invitation';
import { createInvitation } from './create-invitation';
import { listInvitations } from './list-invitations';

/** What the invitation routes need. */
export interface InvitationRoutesDependencies {
  em: EntityManager;
  mailer: Mailer;
  requireUser: RequestHandler;
  publicOrigin: string;
}

/** `/api/teams/:teamId/invitations` (owners): invite and list pending invitations. */
export function teamInvitationRoutes({ em, mailer, requireUser, publicOrigin }: InvitationRoutesDependencies): Router {
  const router = Router({ mergeParams: true });
  router.use(requireUser, requireTeamRole(em, 'owner'));

  router.post('/', async (req, res) => {
    const request = parseBody(createInvitationRequestSchema, req.body);
    const team = currentMembership(res).team.getEntity();
    res.status(201).json(await createInvitation(em, mailer, { team, inviter: currentUser(res), request, publicOrigin }));
  });

  router.get('/', async (_req, res) => {
    res.json(await listInvitations(em, currentMembership(res).team.id));
  });

  return router;
}

/** `/api/invitations/accept`: the invited, signed-in user joins the team. */
export function acceptInvitationRoutes({ em, requireUser }: Pick<InvitationRoutesDependencies, 'em' | 'requireUser'>): Router {
  const router = Router();
  router.post('/accept', requireUser, async (req, res) => {
    const { token } = parseBody(acceptInvitationRequestSchema, req.body);
    res.json(await acceptInvitation(em, currentUser(res), token));
  });
  return router;
}
