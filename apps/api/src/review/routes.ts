import type { EntityManager } from '@mikro-orm/postgresql';
import { approveReviewRequestSchema, returnReviewRequestSchema, submitReviewRequestSchema } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';
import { z } from 'zod';
import { currentRecordId, currentUserId } from '../http/locals';
import { parseBody, parseIdParam } from '../http/validate';
import type { Mailer } from '../mail/mailer';
import { RECORD_KINDS, requireRecordRole } from '../teams/require-record-role';
import { getRevision, listRevisions } from './get-revisions';
import { runReviewStep } from './run-review-step';

/** What the review routes need. */
export interface ReviewRoutesDependencies {
  em: EntityManager;
  mailer: Mailer;
  requireUser: RequestHandler;
  publicOrigin: string;
}

const revisionNumberSchema = z.coerce.number().int().positive().max(1_000_000);

/**
 * Review of reaction sets: `POST /api/reaction-sets/:id/submit` (editor+),
 * `/approve` and `/return` (reviewer+, not the submitter), and the vetted revisions
 * `GET /api/reaction-sets/:id/revisions[/:n]` (viewer+).
 */
export function reviewRoutes({ em, mailer, requireUser, publicOrigin }: ReviewRoutesDependencies): Router {
  const router = Router();
  const services = { mailer, publicOrigin };
  const asSet = (role: 'viewer' | 'editor' | 'reviewer') => requireRecordRole(em, RECORD_KINDS.reactionSet, role);

  router.post('/reaction-sets/:id/submit', requireUser, asSet('editor'), async (req, res) => {
    const { comment, version } = parseBody(submitReviewRequestSchema, req.body);
    res.json(await runReviewStep(em, services, { step: 'submitted', setId: currentRecordId(res), actorId: currentUserId(res), comment: comment ?? '', version }));
  });

  router.post('/reaction-sets/:id/approve', requireUser, asSet('reviewer'), async (req, res) => {
    const { comment, version } = parseBody(approveReviewRequestSchema, req.body);
    res.json(await runReviewStep(em, services, { step: 'approved', setId: currentRecordId(res), actorId: currentUserId(res), comment: comment ?? '', version }));
  });

  router.post('/reaction-sets/:id/return', requireUser, asSet('reviewer'), async (req, res) => {
    const { comment, version } = parseBody(returnReviewRequestSchema, req.body);
    res.json(await runReviewStep(em, services, { step: 'returned', setId: currentRecordId(res), actorId: currentUserId(res), comment, version }));
  });

  router.get('/reaction-sets/:id/revisions', requireUser, asSet('viewer'), async (_req, res) => {
    res.json(await listRevisions(em, currentRecordId(res)));
  });

  router.get('/reaction-sets/:id/revisions/:n', requireUser, asSet('viewer'), async (req, res) => {
    const number = parseIdParam(revisionNumberSchema, req.params['n'], 'REVISION_NOT_FOUND');
    res.json(await getRevision(em, currentRecordId(res), number));
  });

  return router;
}
