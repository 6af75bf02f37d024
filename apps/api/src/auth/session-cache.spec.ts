import { describe, expect, it } from 'vitest';
import type { User } from '../users/user.entity';
import { SessionCache } from './session-cache';
import type { SessionClaims } from './session-token';

const user = { id: 'u1', email: 'a@example.org', displayName: 'A', createdAt: new Date(0) } as User;
const claims = (expiresAt = 1_000_000): SessionClaims => ({ userId: 'u1', tokenId: 'j1', expiresAt: new Date(expiresAt) });

describe('SessionCache', () => {
  it('When a token was remembered, then it is found with its claims until its time is up', () => {
    const cache = new SessionCache(1_000);
    cache.remember('t1', claims(), user, 0);
    expect(cache.find('t1', 999)?.user.email).toBe('a@example.org');
    expect(cache.find('t1', 999)?.claims.tokenId).toBe('j1');
    expect(cache.find('t1', 1_000)).toBeUndefined();
  });

  it('When the token itself expires before the cache time, then it is trusted only until its expiry', () => {
    const cache = new SessionCache(1_000);
    cache.remember('t1', claims(500), user, 0);
    expect(cache.find('t1', 499)).toBeDefined();
    expect(cache.find('t1', 500)).toBeUndefined();
  });

  it('When another text is presented, then it is not trusted, even with the same token id', () => {
    const cache = new SessionCache(1_000);
    cache.remember('t1', claims(), user, 0);
    expect(cache.find('t1x', 1)).toBeUndefined();
  });

  it('When a token is forgotten (sign-out), then it is no longer found', () => {
    const cache = new SessionCache(1_000);
    cache.remember('t1', claims(), user, 0);
    cache.forget('t1');
    expect(cache.find('t1', 1)).toBeUndefined();
  });

  it('When the cache is full, then the oldest token makes room', () => {
    const cache = new SessionCache(1_000, 2);
    cache.remember('t1', claims(), user, 0);
    cache.remember('t2', claims(), user, 0);
    cache.remember('t3', claims(), user, 0);
    expect([cache.find('t1', 1), cache.find('t2', 1), cache.find('t3', 1)].map(Boolean)).toEqual([false, true, true]);
  });

  it('When the time to trust is 0, then nothing is kept', () => {
    const cache = new SessionCache(0);
    cache.remember('t1', claims(), user, 0);
    expect(cache.find('t1', 0)).toBeUndefined();
  });
});
