import { describe, expect, it } from 'vitest';
import { loadConfig } from './env';

describe('loadConfig', () => {
  it('When nothing is set, then the local defaults apply', () => {
    const config = loadConfig({});

    expect(config).toMatchObject({
      nodeEnv: 'development',
      host: '127.0.0.1',
      port: 4300,
      database: { host: '127.0.0.1', port: 54320, name: 'tallus', user: 'tallus', password: 'tallus-local-only' },
      jwt: { ttl: '8h' },
      publicOrigin: 'http://127.0.0.1:4300',
      webDist: 'dist/web/browser',
      smtp: undefined,
      isDemoSeedWanted: false,
    });
  });

  it('When PORT is set and PUBLIC_ORIGIN is not, then invitation links use that port', () => {
    expect(loadConfig({ PORT: '5000' }).publicOrigin).toBe('http://127.0.0.1:5000');
  });

  it('When production runs without JWT_SECRET, then start-up fails naming the key', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', SMTP_HOST: 'mail.example' })).toThrow(/JWT_SECRET/);
  });

  it('When production runs without SMTP_HOST, then start-up fails naming the key', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', JWT_SECRET: 'x'.repeat(32) })).toThrow(/SMTP_HOST/);
  });

  it.each([
    ['PORT', 'abc'],
    ['JWT_TTL', 'eight hours'],
    ['BCRYPT_COST', '4'],
    ['NODE_ENV', 'staging'],
    ['PUBLIC_ORIGIN', 'not a url'],
  ])('When %s is %s, then start-up fails naming the key', (key, value) => {
    expect(() => loadConfig({ [key]: value })).toThrow(new RegExp(key));
  });

  it('When a key is set to the empty string, then its default applies', () => {
    expect(loadConfig({ PORT: '' }).port).toBe(4300);
  });
});
