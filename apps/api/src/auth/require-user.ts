import type { EntityManager } from '@mikro-orm/postgresql';
import type { RequestHandler } from 'express';
import { AuthenticationError } from '../errors/app-errors';
import { User } from '../users/user.entity';
import { RevokedToken } from './revoked-token.entity';
import type { SessionCache } from './session-cache';
import { sessionKey, verifySessionToken } from './session-token';

/**
 * Middleware that admits only requests with a valid `Authorization: Bearer`
 * token that was not signed out and whose user still exists. Leaves the user
 * and the token's claims in `res.locals`.
 *
 * A token checked within the session cache's time is trusted without the signature check and the
 * look-ups; the user then joins the request's EntityManager from the cached columns, when first asked for.
 *
 * @param em the request-scoped EntityManager (MikroORM's global one resolves to the request's fork)
 * @param secret the token signing secret
 * @param sessions the app's session cache
 * @throws AuthenticationError AUTH_REQUIRED without a token, AUTH_INVALID_TOKEN with a bad one
 */
export function requireUser(em: EntityManager, secret: string, sessions: SessionCache): RequestHandler {
  const key = sessionKey(secret);
  return async (req, res, next) => {
    const token = bearerToken(req.headers.authorization);
    if (!token) throw new AuthenticationError('AUTH_REQUIRED', 'Sign in first: send Authorization: Bearer <token>.');
    const cached = sessions.find(token, Date.now());
    if (cached) {
      // The user joins the request's EntityManager only when a route asks for it (`currentUser`):
      // the chemistry routes never do, and the merge was a tenth of their time.
      const requestEm = em.getContext();
      res.locals.session = cached.claims;
      res.locals.loadUser = () => requestEm.merge(User, cached.user);
      return next();
    }
    const claims = verifySessionToken(token, key);
    const [user, revoked] = await Promise.all([
      em.findOne(User, { id: claims.userId }),
      em.count(RevokedToken, { jti: claims.tokenId }),
    ]);
    if (!user || revoked > 0) throw new AuthenticationError('AUTH_INVALID_TOKEN', 'The session has ended; sign in again.');
    sessions.remember(token, claims, user, Date.now());
    res.locals.user = user;
    res.locals.session = claims;
    next();
  };
}

/** The token of an `Authorization: Bearer <token>` header, if any. */
export function bearerToken(header: string | undefined): string | undefined {
  const match = /^Bearer\s+(\S+)\s*$/i.exec(header ?? '');
  return match?.[1];
}
