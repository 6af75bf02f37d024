import type { EntityManager } from '@mikro-orm/postgresql';
import { RevokedToken } from './revoked-token.entity';
import type { SessionClaims } from './session-token';

/**
 * Ends a session: the token is refused from now on, though it has not expired.
 * Also prunes revocations of tokens that have expired anyway.
 *
 * @param em request-scoped EntityManager
 * @param session the claims of the token to revoke
 */
export async function signOut(em: EntityManager, session: SessionClaims): Promise<void> {
  await em.nativeDelete(RevokedToken, { expiresAt: { $lt: new Date() } });
  await em.upsert(RevokedToken, { jti: session.tokenId, expiresAt: session.expiresAt });
}
