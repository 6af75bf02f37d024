import type { User } from '../users/user.entity';

/** What the cache keeps of a signed-in user: the columns every route may read. */
export interface CachedUser {
  id: string;
  email: string;
  displayName: string;
  createdAt: Date;
}

interface Entry {
  user: CachedUser;
  /** Clock time (ms) after which the entry must be checked against the database again. */
  until: number;
}

/**
 * Remembers, for a short time, that a session token was valid and whose it was, so that busy
 * routes (the stateless chemistry routes above all) skip the two database look-ups of every
 * authenticated request. Sign-out in this process forgets the token at once; in a deployment with
 * several API processes a signed-out token stays usable on the others for at most `ttlMs`.
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

  /** The cached user of a token that is still trusted at `now`, if any. */
  find(tokenId: string, now: number): CachedUser | undefined {
    const entry = this.entries.get(tokenId);
    if (!entry) return undefined;
    if (entry.until <= now) {
      this.entries.delete(tokenId);
      return undefined;
    }
    return entry.user;
  }

  /** Trusts a token that was just checked against the database. */
  remember(tokenId: string, user: User, now: number): void {
    if (this.ttlMs <= 0) return;
    if (this.entries.size >= this.maxEntries) {
      // Maps iterate in insertion order: the first key is the oldest entry.
      const oldest = this.entries.keys().next().value;
      if (oldest !== undefined) this.entries.delete(oldest);
    }
    const cached: CachedUser = { id: user.id, email: user.email, displayName: user.displayName, createdAt: user.createdAt };
    this.entries.set(tokenId, { user: cached, until: now + this.ttlMs });
  }

  /** Stops trusting a token (sign-out). */
  forget(tokenId: string): void {
    this.entries.delete(tokenId);
  }
}
