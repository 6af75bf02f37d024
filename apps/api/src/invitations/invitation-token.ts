import { createHash, randomBytes } from 'node:crypto';

/** A new invitation token: 32 random bytes, URL-safe base64 (43 characters). */
export function createInvitationToken(): string {
  return randomBytes(32).toString('base64url');
}

/** The hex SHA-256 of a token: all the database keeps of it. */
export function hashInvitationToken(token: string): string {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}
