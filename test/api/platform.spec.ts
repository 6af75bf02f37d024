import net from 'node:net';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { healthResponseSchema } from '@tallus/contracts';
import { startTestApp, type TestApp } from './support/test-app';

describe('Health, headers and unknown routes', () => {
  let testApp: TestApp;

  beforeAll(async () => {
    testApp = await startTestApp();
  });

  afterAll(async () => {
    await testApp.close();
  });

  it('When /api/health is called, then it answers 200 with status and database ok', async () => {
    const response = await request(testApp.app).get('/api/health');

    expect(response.status).toBe(200);
    expect(healthResponseSchema.parse(response.body)).toEqual({ status: 'ok', database: 'ok' });
  });

  it.each(['/api/health', '/api/auth/me', '/api/nowhere'])("When %s is called, then helmet's headers are on the response", async (path) => {
    const response = await request(testApp.app).get(path);

    expect(response.headers['x-content-type-options']).toBe('nosniff');
    expect(response.headers['x-frame-options']).toBe('SAMEORIGIN');
    expect(response.headers['content-security-policy']).toContain("default-src 'self'");
    expect(response.headers['x-powered-by']).toBeUndefined();
    expect(response.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
  });

  it('When an unknown API route is called, then the answer is a 404 problem body', async () => {
    const response = await request(testApp.app).post('/api/reactions/nowhere').send({});

    expect(response.status).toBe(404);
    expect(response.headers['content-type']).toMatch(/^application\/problem\+json/);
    expect(response.body.code).toBe('NOT_FOUND');
  });

  it('When the database connection is gone, then /api/health answers 503 DATABASE_UNAVAILABLE', async () => {
    const broken = await startTestApp();
    await broken.orm.close(true);

    const response = await request(broken.app).get('/api/health');
    await broken.close();

    expect(response.status).toBe(503);
    expect(response.body.code).toBe('DATABASE_UNAVAILABLE');
  });

  it('When anything in a test tries to reach a host off loopback, then the connection is refused at once', () => {
    expect(() => net.connect(80, '192.0.2.1')).toThrow(/Outgoing network is blocked/);
  });
});
