import type { Role } from '@tallus/contracts';
import type { Response } from 'express';
import type { SessionClaims } from '../auth/session-token';
import type { Membership } from '../teams/membership.entity';
import type { User } from '../users/user.entity';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    /** What `requestLog` gives every request. */
    interface Request {
      /** The request's id, also answered as `X-Request-Id`. */
      id: string;
      /** The request's logger, carrying its request id. */
      log: import('pino').Logger;
    }
    /** What the auth and team middleware leave for the route handlers. */
    interface Locals {
      /** The signed-in user, set by `requireUser` (or made from `loadUser` on first use). */
      user?: User;
      /** Makes the signed-in user from the session cache; `requireUser` leaves it instead of `user` on a cache hit. */
      loadUser?: () => User;
      /** The claims of the caller's token, set by `requireUser`. */
      session?: SessionClaims;
      /** The caller's membership of `:teamId` (with its team), set by `requireTeamRole`. */
      membership?: Membership;
      /** The caller's role in the team of the route's record, set by `requireRecordRole`. */
      recordRole?: Role;
      /** The id of the route's record (`:id`), set by `requireRecordRole` once the caller may act on it. */
      recordId?: string;
    }
  }
}

/**
 * The signed-in user of a route behind `requireUser`.
 *
 * @throws Error when the route forgot `requireUser` (a bug, so a 500)
 */
export function currentUser(res: Response): User {
  res.locals.user ??= res.locals.loadUser?.();
  if (!res.locals.user) throw new Error('currentUser() called on a route without requireUser');
  return res.locals.user;
}

/**
 * The id of the signed-in user of a route behind `requireUser`, without making the user entity.
 *
 * @throws Error when the route forgot `requireUser` (a bug, so a 500)
 */
export function currentUserId(res: Response): string {
  if (!res.locals.session) throw new Error('currentUserId() called on a route without requireUser');
  return res.locals.session.userId;
}

/**
 * The caller's membership of the route's team, behind `requireTeamRole`.
 *
 * @throws Error when the route forgot `requireTeamRole` (a bug, so a 500)
 */
export function currentMembership(res: Response): Membership {
  if (!res.locals.membership) throw new Error('currentMembership() called on a route without requireTeamRole');
  return res.locals.membership;
}

/**
 * The id of the route's record, behind `requireRecordRole`.
 *
 * @throws Error when the route forgot `requireRecordRole` (a bug, so a 500)
 */
export function currentRecordId(res: Response): string {
  if (!res.locals.recordId) throw new Error('currentRecordId() called on a route without requireRecordRole');
  return res.locals.recordId;
}
