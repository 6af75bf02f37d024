import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { RateLimitedError } from '../errors/app-errors';

/** How many failures one client may make in one window. */
export interface AuthRateLimitSettings {
  max: number;
  windowMs: number;
}

/**
 * Rate limit of sign-in (and registration) attempts: each failed attempt
 * (status 400 or above) counts against the pair of client IP address and the
 * e-mail address in the body; successful ones do not. Past the limit the
 * answer is 429 AUTH_RATE_LIMITED with a Retry-After header, until the window
 * ends. Each call makes a limiter with its own in-memory counts.
 *
 * @param settings maximum failures and window length
 */
export function createAuthRateLimit(settings: AuthRateLimitSettings): RequestHandler {
  return rateLimit({
    windowMs: settings.windowMs,
    limit: settings.max,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? 'unknown')}|${emailOf(req.body)}`,
    handler: (_req, res, next) => {
      res.setHeader('Retry-After', String(Math.ceil(settings.windowMs / 1000)));
      next(new RateLimitedError('AUTH_RATE_LIMITED', 'Too many failed attempts; wait a while before trying again.'));
    },
  });
}

/** The body's e-mail address as the schema would normalise it, or '' when absent. */
function emailOf(body: unknown): string {
  const email = (body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? email.trim().toLowerCase() : '';
}
