import jwt from 'jsonwebtoken';
import { describe, expect, it } from 'vitest';
import { issueSessionToken, verifySessionToken } from './session-token';

const secret = 'a-test-secret-that-is-long-enough-for-hs256';
const userId = '6f1c8a52-5a3e-4c57-9d0f-0b9f5f6d2a11';

describe('session tokens', () => {
  it('When a fresh token is verified, then it names the user and expires after the TTL', () => {
    const token = issueSessionToken(userId, { secret, ttl: '2h' });

    const claims = verifySessionToken(token, secret);

    expect(claims.userId).toBe(userId);
    expect(claims.tokenId).toMatch(/^[0-9a-f-]{36}$/);
    expect(Math.abs(claims.expiresAt.getTime() - (Date.now() + 2 * 3600_000))).toBeLessThan(5_000);
  });

  it.each([
    ['signed with another secret', () => issueSessionToken(userId, { secret: 'another-secret-of-sufficient-length!!', ttl: '1h' })],
    ['expired', () => jwt.sign({ sub: userId, jti: 'x', exp: Math.floor(Date.now() / 1000) - 10 }, secret)],
    ['unsigned (alg none)', () => jwt.sign({ sub: userId, jti: 'x' }, '', { algorithm: 'none', expiresIn: '1h' })],
    ['without a subject', () => jwt.sign({ jti: 'x' }, secret, { expiresIn: '1h' })],
    ['not a JWT at all', () => 'not-a-token'],
  ])('When the token is %s, then it is refused with AUTH_INVALID_TOKEN', (_label, makeToken) => {
    expect(() => verifySessionToken(makeToken(), secret)).toThrow(expect.objectContaining({ code: 'AUTH_INVALID_TOKEN' }));
  });

  it('When the TTL is a number of seconds, then the expiry follows it', () => {
    const claims = verifySessionToken(issueSessionToken(userId, { secret, ttl: '60' }), secret);

    expect(Math.abs(claims.expiresAt.getTime() - (Date.now() + 60_000))).toBeLessThan(5_000);
  });
});
