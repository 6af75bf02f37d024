import { describe, expect, it } from 'vitest';
import type { User } from '../users/user.entity';
import { SessionCache } from './session-cache';

const user = { id: 'u1', email: 'a@example.org', displayName: 'A', createdAt: new Date(0) } as User;

describe('SessionCache', () => {
  it('When a token was remembered, then it is found until its time is up', () => {
    const cache = new SessionCache(1_000);
    cache.remember('t1', user, 0);
    expect(cache.find('t1', 999)?.email).toBe('a@example.org');
    expect(cache.find('t1', 1_000)).toBeUndefined();
  });

  it('When a token is forgotten (sign-out), then it is no longer found', () => {
    const cache = new SessionCache(1_000);
    cache.remember('t1', user, 0);
    cache.forget('t1');
    expect(cache.find('t1', 1)).toBeUndefined();
  });

  it('When the cache is full, then the oldest token makes room', () => {
    const cache = new SessionCache(1_000, 2);
    cache.remember('t1', user, 0);
    cache.remember('t2', user, 0);
    cache.remember('t3', user, 0);
    expect([cache.find('t1', 1), cache.find('t2', 1), cache.find('t3', 1)].map(Boolean)).toEqual([false, true, true]);
  });

  it('When the time to trust is 0, then nothing is kept', () => {
    const cache = new SessionCache(0);
    cache.remember('t1', user, 0);
    expect(cache.find('t1', 0)).toBeUndefined();
  });
});
