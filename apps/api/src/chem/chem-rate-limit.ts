import type { RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { RateLimitedError } from '../errors/app-errors';
import { currentUserId } from '../http/locals';

/**
 * Per-user rate limit of the stateless computation routes, so that one account
 * cannot keep the server's CPU busy: `perMinute` requests per user per minute,
 * then 429 CHEM_RATE_LIMITED with Retry-After. `perMinute` 0 turns it off (the
 * benchmark does). Must follow `requireUser`; each call has its own counts.
 */
export function createChemRateLimit(perMinute: number): RequestHandler {
  if (perMinute === 0) return (_req, _res, next) => next();
  return rateLimit({
    windowMs: 60_000,
    limit: perMinute,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (_req, res) => currentUserId(res),
    handler: (_req, res, next) => {
      res.setHeader('Retry-After', '60');
      next(new RateLimitedError('CHEM_RATE_LIMITED', `More than ${perMinute} computations in a minute; wait a moment.`));
    },
  });
}
