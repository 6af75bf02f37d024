import type { EntityManager } from '@mikro-orm/postgresql';
import {
  createNetReactionRequestSchema,
  createReactionRequestSchema,
  createReactionSetRequestSchema,
  reactionSetListQuerySchema,
  reorderReactionsRequestSchema,
  updateNetReactionRequestSchema,
  updateReactionRequestSchema,
  updateReactionSetRequestSchema,
} from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { currentMembership, currentRecordId, currentUserId } from '../http/locals';
import { parseBody } from '../http/validate';
import { createNetReaction, deleteNetReaction, updateNetReaction } from '../net-reactions/save-net-reaction';
import { ReactionsJsonCache } from '../reactions/reactions-json-cache';
import { reorderReactions } from '../reactions/reorder-reactions';
import { createReaction, deleteReaction, updateReaction } from '../reactions/save-reaction';
import { RECORD_KINDS, requireRecordRole } from '../teams/require-record-role';
import { requireTeamRole } from '../teams/require-team-role';
import { getReactionSetJson } from './get-reaction-set-json';
import { listReactionSets } from './list-reaction-sets';
import { createReactionSet, deleteReactionSet, updateReactionSet } from './save-reaction-set';

/**
 * Reaction sets, their reactions and net reactions (viewers read, editors write):
 * `GET/POST /api/teams/:teamId/reaction-sets`, `GET/PATCH/DELETE /api/reaction-sets/:id`,
 * `POST /api/reaction-sets/:id/reactions`, `PATCH/DELETE /api/reactions/:id`,
 * `POST /api/reaction-sets/:id/reorder`, `POST /api/reaction-sets/:id/net-reactions`,
 * `PATCH/DELETE /api/net-reactions/:id`.
 */
export function reactionSetRoutes(em: EntityManager, requireUser: RequestHandler): Router {
  const router = Router();
  // The reactions JSON of recently read sets, valid for one set version each.
  const reactionsCache = new ReactionsJsonCache();
  const asSet = (role: 'viewer' | 'editor') => requireRecordRole(em, RECORD_KINDS.reactionSet, role);
  const asReaction = requireRecordRole(em, RECORD_KINDS.reaction, 'editor');
  const asNet = requireRecordRole(em, RECORD_KINDS.netReaction, 'editor');
  const actorId = (res: Parameters<RequestHandler>[1]) => currentUserId(res);

  router.get('/teams/:teamId/reaction-sets', requireUser, requireTeamRole(em, 'viewer'), async (req, res) => {
    const { state } = parseBody(reactionSetListQuerySchema, req.query);
    res.json(await listReactionSets(em, currentMembership(res).team.id, state));
  });

  router.post('/teams/:teamId/reaction-sets', requireUser, requireTeamRole(em, 'editor'), async (req, res) => {
    const request = parseBody(createReactionSetRequestSchema, req.body);
    res.status(201).json(await createReactionSet(em, { teamId: currentMembership(res).team.id, actorId: actorId(res), request }));
  });

  router.get('/reaction-sets/:id', requireUser, asSet('viewer'), async (_req, res) => {
    const { body, etag } = await getReactionSetJson(em, currentRecordId(res), reactionsCache);
    // With the entity tag set here, Express answers 304 to a matching If-None-Match without hashing the body.
    res.set('ETag', etag).type('application/json').send(body);
  });

  router.patch('/reaction-sets/:id', requireUser, asSet('editor'), async (req, res) => {
    const request = parseBody(updateReactionSetRequestSchema, req.body);
    res.json(await updateReactionSet(em, { setId: currentRecordId(res), actorId: actorId(res), request }));
  });

  router.delete('/reaction-sets/:id', requireUser, asSet('editor'), async (_req, res) => {
    await deleteReactionSet(em, currentRecordId(res), actorId(res));
    res.status(204).end();
  });

  router.post('/reaction-sets/:id/reactions', requireUser, asSet('editor'), async (req, res) => {
    const request = parseBody(createReactionRequestSchema, req.body);
    res.status(201).json(await createReaction(em, { setId: currentRecordId(res), actorId: actorId(res), request }));
  });

  router.post('/reaction-sets/:id/reorder', requireUser, asSet('editor'), async (req, res) => {
    const { reactionIds } = parseBody(reorderReactionsRequestSchema, req.body);
    res.json(await reorderReactions(em, { setId: currentRecordId(res), actorId: actorId(res), reactionIds }));
  });

  router.post('/reaction-sets/:id/net-reactions', requireUser, asSet('editor'), async (req, res) => {
    const request = parseBody(createNetReactionRequestSchema, req.body);
    res.status(201).json(await createNetReaction(em, { setId: currentRecordId(res), actorId: actorId(res), request }));
  });

  router.patch('/reactions/:id', requireUser, asReaction, async (req, res) => {
    const request = parseBody(updateReactionRequestSchema, req.body);
    res.json(await updateReaction(em, { reactionId: currentRecordId(res), actorId: actorId(res), request }));
  });

  router.delete('/reactions/:id', requireUser, asReaction, async (_req, res) => {
    res.json(await deleteReaction(em, currentRecordId(res), actorId(res)));
  });

  router.patch('/net-reactions/:id', requireUser, asNet, async (req, res) => {
    const request = parseBody(updateNetReactionRequestSchema, req.body);
    res.json(await updateNetReaction(em, { netReactionId: currentRecordId(res), actorId: actorId(res), request }));
  });

  router.delete('/net-reactions/:id', requireUser, asNet, async (_req, res) => {
    res.json(await deleteNetReaction(em, currentRecordId(res), actorId(res)));
  });

  return router;
}
