import express from 'express';
import { pino } from 'pino';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { requestLog } from './request-log';

/** A logger that keeps its lines in memory. */
function memoryLogger(level: string) {
  const lines: Array<Record<string, unknown>> = [];
  const logger = pino({ level }, { write: (line: string) => lines.push(JSON.parse(line)) });
  return { logger, lines };
}

describe('requestLog', () => {
  it('When a request is answered, then it carries an X-Request-Id and its log lines carry the same id', async () => {
    const { logger, lines } = memoryLogger('info');
    const app = express();
    app.use(requestLog(logger));
    app.get('/fail', (req, res) => {
      req.log.error('something broke');
      res.status(500).end();
    });

    const response = await request(app).get('/fail').expect(500);

    expect(response.headers['x-request-id']).toMatch(/^[0-9a-f-]{36}$/);
    expect(lines).toEqual([expect.objectContaining({ msg: 'something broke', reqId: response.headers['x-request-id'], method: 'GET', url: '/fail' })]);
  });

  it('When the level is debug, then each answered request is logged with its status; at info, nothing is', async () => {
    for (const [level, expected] of [['debug', 1], ['info', 0]] as const) {
      const { logger, lines } = memoryLogger(level);
      const app = express();
      app.use(requestLog(logger));
      app.get('/ok', (_req, res) => res.status(204).end());

      await request(app).get('/ok').expect(204);
      await new Promise((resolve) => setImmediate(resolve));

      expect(lines.filter((line) => line['msg'] === 'request answered')).toHaveLength(expected);
    }
  });
});
