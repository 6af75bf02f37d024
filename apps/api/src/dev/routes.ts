import type { OutboxMessage } from '@tallus/contracts';
import { Router, type RequestHandler } from 'express';

/** Where the received messages come from (the fake SMTP server). */
export interface OutboxSource {
  /** Received messages, newest first. */
  messages(): OutboxMessage[];
}

/**
 * `/api/dev`: development aids, mounted only outside production.
 * `GET /outbox` lists what the fake SMTP server received, to signed-in users.
 */
export function devRoutes(outbox: OutboxSource, requireUser: RequestHandler): Router {
  const router = Router();
  router.get('/outbox', requireUser, (_req, res) => {
    res.json(outbox.messages());
  });
  return router;
}
