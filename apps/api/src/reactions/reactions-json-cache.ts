import type { ReactionsJson } from './read-reactions-json';

/**
 * Keeps the reactions JSON of recently read sets, one entry per set, valid for exactly one set
 * version: every write to a set, its reactions or its net reactions bumps the version (see
 * `openSetForEdit`), so a hit can never be stale. Reading the version is one indexed row; building
 * the JSON of a large set is most of a GET. One instance per app (created in `createApp`).
 */
export class ReactionsJsonCache {
  private readonly entries = new Map<string, ReactionsJson>();

  /** @param maxSets how many sets are kept before the least recently stored is dropped */
  constructor(private readonly maxSets = 64) {}

  /** The cached reactions of `setId` at `version`, if that is what is stored. */
  find(setId: string, version: number): ReactionsJson | undefined {
    const entry = this.entries.get(setId);
    return entry && entry.version === version ? entry : undefined;
  }

  /** Stores a set's reactions, replacing any older version of the same set. */
  store(setId: string, entry: ReactionsJson): void {
    this.entries.delete(setId);
    if (this.entries.size >= this.maxSets) {
      const oldest = this.entries.keys().next().value;
      if (oldest !== undefined) this.entries.delete(oldest);
    }
    this.entries.set(setId, entry);
  }
}
