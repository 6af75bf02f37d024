import type { EntityManager } from '@mikro-orm/postgresql';
import { copyPublicationRequestSchema, publicationIdSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentRecordId, currentUserId } from '../http/locals';
import { parseBody, parseIdParam } from '../http/validate';
import { RECORD_KINDS, requireRecordRole } from '../teams/require-record-role';
import { requireTeamRole } from '../teams/require-team-role';
import { copyPublication } from './copy-publication';
import { getPublication, listLibrary, publishSet } from './publications';

/**
 * The shared library: `POST /api/reaction-sets/:id/publish` (owners, vetted sets),
 * `GET /api/library` and `GET /api/library/:publicationId` (any signed-in user),
 * `POST /api/library/:publicationId/copy` {teamId} (editor+ in the target team).
 */
export function libraryRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();

  router.post('/reaction-sets/:id/publish', requireUser, requireRecordRole(em, RECORD_KINDS.reactionSet, 'owner'), async (_req, res) => {
    res.status(201).json(await publishSet(em, currentRecordId(res), currentUserId(res)));
  });

  router.get('/library', requireUser, async (_req, res) => {
    res.json(await listLibrary(em));
  });

  router.get('/library/:publicationId', requireUser, async (req, res) => {
    res.json(await getPublication(em, parseIdParam(publicationIdSchema, req.params['publicationId'], 'PUBLICATION_NOT_FOUND')));
  });

  // The target team comes in the body; requireTeamRole reads it as the route's :teamId.
  const targetTeam: RequestHandler = (req, _res, next) => {
    req.params['teamId'] = parseBody(copyPublicationRequestSchema, req.body).teamId;
    next();
  };

  router.post('/library/:publicationId/copy', requireUser, targetTeam, requireTeamRole(em, 'editor'), async (req, res) => {
    const publicationId = parseIdParam(publicationIdSchema, req.params['publicationId'], 'PUBLICATION_NOT_FOUND');
    res.status(201).json(await copyPublication(em, { publicationId, teamId: currentMembership(res).team.id, actorId: currentUserId(res) }));
  });

  return router;
}
