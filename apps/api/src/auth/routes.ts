import type { EntityManager } from '@mikro-orm/postgresql';
import { loginRequestSchema, registerRequestSchema, type AuthSession } from '@tallus/contracts';
import { Router } from 'express';
import type { Config } from '../config/env';
import { currentUser } from '../http/locals';
import { parseBody } from '../http/validate';
import { toUserView } from '../users/to-user-view';
import { createAuthRateLimit } from './auth-rate-limit';
import { getCurrentUser } from './get-current-user';
import { registerUser } from './register-user';
import { bearerToken } from './require-user';
import { issueSessionToken, verifySessionToken } from './session-token';
import { signIn } from './sign-in';
import type { SessionCache } from './session-cache';
import { signOut } from './sign-out';
import type { RequestHandler } from 'express';
import type { User } from '../users/user.entity';

/** What the auth routes need. */
export interface AuthRoutesDependencies {
  em: EntityManager;
  config: Config;
  requireUser: RequestHandler;
  /** The app's session cache, told at sign-out to stop trusting the token. */
  sessions: SessionCache;
}

/** `/api/auth`: register, login, logout, me. */
export function authRoutes({ em, config, requireUser, sessions }: AuthRoutesDependencies): Router {
  const router = Router();
  const session = (user: User): AuthSession => ({ token: issueSessionToken(user.id, config.jwt), user: toUserView(user) });

  router.post('/register', createAuthRateLimit(config.authRateLimit), async (req, res) => {
    const user = await registerUser(em, parseBody(registerRequestSchema, req.body), config.bcryptCost);
    res.status(201).json(session(user));
  });

  router.post('/login', createAuthRateLimit(config.authRateLimit), async (req, res) => {
    const user = await signIn(em, parseBody(loginRequestSchema, req.body));
    res.json(session(user));
  });

  // Signing out never fails for the client: without a valid token there is no session left to end.
  router.post('/logout', async (req, res) => {
    const token = bearerToken(req.headers.authorization);
    const claims = token ? tryVerify(token, config.jwt.secret) : undefined;
    if (token && claims) {
      sessions.forget(token);
      await signOut(em, claims);
    }
    res.status(204).end();
  });

  router.get('/me', requireUser, async (_req, res) => {
    res.json(await getCurrentUser(em, currentUser(res)));
  });

  return router;
}

function tryVerify(token: string, secret: string) {
  try {
    return verifySessionToken(token, secret);
  } catch {
    // An invalid or expired token is already unusable; nothing to revoke.
    return undefined;
  }
}
