import type { StatusCounts } from '@tallus/contracts';
import type { ReactionsJson } from './read-reactions-json';

/** What is kept of a set's reactions: the end of the set's JSON answer, ready to send. */
export interface CachedReactions {
  /** The set version the reactions belong to. */
  version: number;
  /** UTF-8 of `,"reactionCount":…,"statusCounts":{…},"reactions":[…]}`: the answer after the set's other fields. */
  tail: Buffer;
}

/**
 * Keeps the reactions of recently read sets, one entry per set, valid for exactly one set
 * version: every write to a set, its reactions or its net reactions bumps the version (see
 * `openSetForEdit`), so a hit can never be stale. Reading the version is one indexed row; building
 * the JSON of a large set, and turning its text into bytes, is most of a GET. One instance per app
 * (created in `reactionSetRoutes`).
 */
export class ReactionsJsonCache {
  private readonly entries = new Map<string, CachedReactions>();

  /** @param maxSets how many sets are kept before the least recently stored is dropped */
  constructor(private readonly maxSets = 64) {}

  /** The cached reactions of `setId` at `version`, if that is what is stored. */
  find(setId: string, version: number): CachedReactions | undefined {
    const entry = this.entries.get(setId);
    return entry && entry.version === version ? entry : undefined;
  }

  /**
   * Stores a set's reactions, replacing any older version of the same set.
   *
   * @param emptyCounts zero for every balance status, so that every status appears in the counts
   * @returns the stored entry
   */
  store(setId: string, read: ReactionsJson, emptyCounts: StatusCounts): CachedReactions {
    const statusCounts: StatusCounts = { ...emptyCounts, ...read.counts };
    const reactionCount = Object.values(statusCounts).reduce((sum, count) => sum + count, 0);
    const tail = Buffer.from(`,"reactionCount":${reactionCount},"statusCounts":${JSON.stringify(statusCounts)},"reactions":${read.reactions}}`, 'utf8');
    const entry: CachedReactions = { version: read.version, tail };
    this.entries.delete(setId);
    if (this.entries.size >= this.maxSets) {
      const oldest = this.entries.keys().next().value;
      if (oldest !== undefined) this.entries.delete(oldest);
    }
    this.entries.set(setId, entry);
    return entry;
  }
}
