import { createSecretKey, randomUUID, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import { AuthenticationError } from '../errors/app-errors';

/** What a valid session token says. */
export interface SessionClaims {
  /** Id of the signed-in user (`sub`). */
  userId: string;
  /** Unique id of this token (`jti`), used to sign it out. */
  tokenId: string;
  /** When the token stops being valid. */
  expiresAt: Date;
}

/** Signing settings of session tokens. */
export interface TokenSettings {
  secret: string;
  /** Lifetime: seconds or a number with s, m, h or d. */
  ttl: string;
}

/**
 * Signs a session token (HS256) for a user.
 *
 * @param userId the user's id, stored as `sub`
 * @param settings secret and lifetime
 */
export function issueSessionToken(userId: string, settings: TokenSettings): string {
  const expiresIn = /^\d+$/.test(settings.ttl) ? Number(settings.ttl) : (settings.ttl as jwt.SignOptions['expiresIn'] & string);
  return jwt.sign({}, settings.secret, { algorithm: 'HS256', subject: userId, jwtid: randomUUID(), expiresIn });
}

/**
 * The HS256 key of a secret, made once. Given a string, jsonwebtoken first tries to read it as
 * a PEM public key on every verify (node's createPublicKey, then a caught error), which cost
 * about 2 ms per request; a secret KeyObject skips that.
 */
export function sessionKey(secret: string): KeyObject {
  return createSecretKey(Buffer.from(secret, 'utf8'));
}

/**
 * Checks a session token's signature, algorithm and expiry.
 *
 * @param secret the signing secret, or its {@link sessionKey} (faster on hot paths)
 * @throws AuthenticationError AUTH_INVALID_TOKEN when any check fails
 */
export function verifySessionToken(token: string, secret: string | KeyObject): SessionClaims {
  let payload: jwt.JwtPayload | string;
  try {
    payload = jwt.verify(token, secret, { algorithms: ['HS256'] });
  } catch {
    // jsonwebtoken throws for every kind of bad token; the client only needs to sign in again.
    throw invalidToken();
  }
  if (typeof payload === 'string' || !payload.sub || !payload.jti || !payload.exp) throw invalidToken();
  return { userId: payload.sub, tokenId: payload.jti, expiresAt: new Date(payload.exp * 1000) };
}

function invalidToken(): AuthenticationError {
  return new AuthenticationError('AUTH_INVALID_TOKEN', 'The session token is invalid or has expired; sign in again.');
}
