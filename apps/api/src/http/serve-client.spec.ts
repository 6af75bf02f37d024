import { mkdtempSync, mkdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import express from 'express';
import request from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { serveClient } from './serve-client';

describe('serveClient', () => {
  let app: express.Express;

  beforeAll(() => {
    const folder = mkdtempSync(join(tmpdir(), 'tallus-web-'));
    mkdirSync(join(folder, 'fonts'));
    writeFileSync(join(folder, 'index.html'), '<!doctype html><title>Tallus</title>');
    writeFileSync(join(folder, 'main-PFD3CK57.js'), 'console.log(1)');
    writeFileSync(join(folder, 'fonts', 'tallus-fonts.css'), 'body{}');
    app = express();
    app.use(serveClient(folder)!);
    app.use((_req, res) => void res.status(404).send('fallthrough'));
  });

  it.each(['/', '/teams/123/members', '/invitations/accept?token=abc'])('When %s is requested, then index.html answers, never cached', async (path) => {
    const response = await request(app).get(path);

    expect(response.status).toBe(200);
    expect(response.text).toContain('<title>Tallus</title>');
    expect(response.headers['cache-control']).toBe('no-cache');
  });

  it('When a hashed bundle is requested, then it is served with a one-year immutable cache', async () => {
    const response = await request(app).get('/main-PFD3CK57.js');

    expect(response.status).toBe(200);
    expect(response.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it.each(['/api/teams', '/api', '/gone-ABCDEFGH.js'])('When %s is requested, then the client does not answer it', async (path) => {
    const response = await request(app).get(path);

    expect(response.text).toBe('fallthrough');
  });

  it('When the folder has no index.html, then there is nothing to serve', () => {
    expect(serveClient(mkdtempSync(join(tmpdir(), 'tallus-empty-')))).toBeUndefined();
  });
});
