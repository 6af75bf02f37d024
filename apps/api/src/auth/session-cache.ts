import type { User } from '../users/user.entity';
import type { SessionClaims } from './session-token';

/** What the cache keeps of a signed-in user: the columns every route may read. */
export interface CachedUser {
  id: string;
  email: string;
  displayName: string;
  createdAt: Date;
}

/** A trusted session: the token's checked claims and its user. */
export interface CachedSession {
  claims: SessionClaims;
  user: CachedUser;
}

interface Entry extends CachedSession {
  /** Clock time (ms) after which the token must be checked again: the cache time, or the token's expiry if sooner. */
  until: number;
}

/**
 * Remembers, for a short time, that a session token was valid and whose it was, so that busy
 * routes (the stateless chemistry routes above all) skip the signature check and the two database
 * look-ups of every authenticated request. Entries are keyed by the whole token text: only the
 * very string whose signature was checked is trusted, and never past its own expiry.
 * Sign-out in this process forgets the token at once; in a deployment with several API processes
 * a signed-out token stays usable on the others for at most `ttlMs`.
 * One instance per app (created in `createApp`), never a module singleton.
 */
export class SessionCache {
  private readonly entries = new Map<string, Entry>();

  /**
   * @param ttlMs how long (ms) a checked token is trusted; 0 turns the cache off
   * @param maxEntries how many tokens are kept before the oldest are dropped
   */
  constructor(
    private readonly ttlMs: number,
    private readonly maxEntries = 10_000,
  ) {}

  /** The session of a token that is still trusted at `now`, if any. */
  find(token: string, now: number): CachedSession | undefined {
    const entry = this.entries.get(token);
    if (!entry) return undefined;
    if (entry.until <= now) {
      this.entries.delete(token);
      return undefined;
    }
    return entry;
  }

  /** Trusts a token whose signature and session were just checked. */
  remember(token: string, claims: SessionClaims, user: User, now: number): void {
    if (this.ttlMs <= 0) return;
    if (this.entries.size >= this.maxEntries) {
      // Maps iterate in insertion order: the first key is the oldest entry.
      const oldest = this.entries.keys().next().value;
      if (oldest !== undefined) this.entries.delete(oldest);
    }
    const cached: CachedUser = { id: user.id, email: user.email, displayName: user.displayName, createdAt: user.createdAt };
    const until = Math.min(now + this.ttlMs, claims.expiresAt.getTime());
    this.entries.set(token, { claims, user: cached, until });
  }

  /** Stops trusting a token (sign-out). */
  forget(token: string): void {
    this.entries.delete(token);
  }
}
