import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { registerUser, startTestApp, TEST_PASSWORD, uniqueEmail, type TestApp } from './support/test-app';

/** A low limit so the spec is quick; this app (and its counts) belongs to this file alone. */
const LIMIT = 3;

describe('Rate limiting of sign-in attempts', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp({ AUTH_RATE_LIMIT_MAX: String(LIMIT), AUTH_RATE_LIMIT_WINDOW_MINUTES: '15' });
  });

  afterAll(async () => {
    await testApp.close();
  });

  const login = (email: string, password: string) => request(testApp.app).post('/api/auth/login').send({ email, password });

  it('When sign-in fails repeatedly for one address, then the attempt past the limit answers 429, even with the right password', async () => {
    const user = await registerUser(testApp.app, 'target');

    const failures = [];
    for (let attempt = 0; attempt < LIMIT; attempt++) failures.push((await login(user.email, 'wrong-password')).status);
    const blocked = await login(user.email, TEST_PASSWORD);

    expect(failures).toEqual(Array(LIMIT).fill(401));
    expect(blocked.status).toBe(429);
    expect(blocked.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(blocked.body.code).toBe('AUTH_RATE_LIMITED');
    expect(Number(blocked.headers['retry-after'])).toBe(15 * 60);
    expect(blocked.body.token).toBeUndefined();
  });

  it('When one address is blocked, then another address from the same client can still sign in', async () => {
    const blocked = uniqueEmail('blocked');
    for (let attempt = 0; attempt <= LIMIT; attempt++) await login(blocked, 'wrong-password');
    const other = await registerUser(testApp.app, 'other');

    const response = await login(other.email, TEST_PASSWORD);

    expect((await login(blocked, 'wrong-password')).status).toBe(429);
    expect(response.status).toBe(200);
  });

  it('When sign-ins succeed many times, then they are not counted against the limit', async () => {
    const user = await registerUser(testApp.app, 'regular');

    const statuses = [];
    for (let attempt = 0; attempt < LIMIT * 2; attempt++) statuses.push((await login(user.email, TEST_PASSWORD)).status);

    expect(statuses).toEqual(Array(LIMIT * 2).fill(200));
  });

  it('When registration fails repeatedly for one address, then it is limited too', async () => {
    const email = uniqueEmail('spam');
    const attempt = () => request(testApp.app).post('/api/auth/register').send({ email, password: 'short', displayName: 'Spam' });

    const statuses = [];
    for (let count = 0; count <= LIMIT; count++) statuses.push((await attempt()).status);

    expect(statuses).toEqual([...Array(LIMIT).fill(400), 429]);
  });
});
