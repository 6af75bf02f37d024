import { describe, expect, it } from 'vitest';
import { createLogger } from './create-logger';

describe('createLogger', () => {
  it('When a request with a bearer token and a cookie is logged, then both are redacted', () => {
    const lines: string[] = [];
    const logger = createLogger('info', { write: (line: string) => void lines.push(line) });

    logger.info({ req: { headers: { authorization: 'Bearer secret-token', cookie: 'sid=secret-cookie', host: 'x' } } }, 'request');

    const output = lines.join('');
    expect(output).not.toContain('secret-token');
    expect(output).not.toContain('secret-cookie');
    expect(output).toContain('"host":"x"');
    expect(output).toContain('[redacted]');
  });
});
