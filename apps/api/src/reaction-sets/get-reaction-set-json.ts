import { createHash } from 'node:crypto';
import { NotFoundError } from '@mikro-orm/core';
import type { EntityManager } from '@mikro-orm/postgresql';
import type { CachedReactions, ReactionsJsonCache } from '../reactions/reactions-json-cache';
import { readReactionsJson } from '../reactions/read-reactions-json';
import { readReactionSetHeadJson, type ReactionSetHeadJson } from './read-reaction-set-head-json';
import { emptyStatusCounts } from './to-set-view';

/** The answer of `GET /api/reaction-sets/:id`, as bytes, with its entity tag. */
export interface ReactionSetBody {
  body: Buffer;
  /** A weak entity tag: the set's id and version fix the reactions, and the hash covers the rest. */
  etag: string;
}

/**
 * The JSON answer of `GET /api/reaction-sets/:id` (the fields of `getReactionSet`'s answer): the
 * set's other fields come from one statement on every call, the reactions from the cache when the
 * set's version has not changed, else from PostgreSQL as text ({@link readReactionsJson}). Neither
 * part is parsed or serialised again in Node, so a set of hundreds of reactions costs about as
 * much as a small one. The two reads are not one snapshot; when a write falls between them, the
 * head is read again until both parts belong to the same version.
 *
 * @throws NotFoundError (MikroORM's) when the set is gone
 */
export async function getReactionSetJson(em: EntityManager, setId: string, cache: ReactionsJsonCache): Promise<ReactionSetBody> {
  for (let attempt = 1; ; attempt++) {
    const head = await readReactionSetHeadJson(em, setId);
    if (!head) throw NotFoundError.findOneFailed('ReactionSet', { id: setId });
    let reactions = cache.find(setId, head.version);
    if (!reactions) {
      const read = await readReactionsJson(em, setId);
      if (!read) throw NotFoundError.findOneFailed('ReactionSet', { id: setId });
      reactions = cache.store(setId, read, emptyStatusCounts());
    }
    if (reactions.version === head.version || attempt === 3) return compose(head, reactions);
  }
}

function compose(head: ReactionSetHeadJson, reactions: CachedReactions): ReactionSetBody {
  // The head is one JSON object; its closing brace gives way to the reactions' tail, which closes it.
  const open = Buffer.from(head.text.slice(0, head.text.lastIndexOf('}')), 'utf8');
  const hash = createHash('sha1').update(open).digest('base64url').slice(0, 22);
  return { body: Buffer.concat([open, reactions.tail]), etag: `W/"${reactions.version}-${hash}"` };
}
