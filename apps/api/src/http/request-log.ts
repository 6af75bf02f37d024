import { randomUUID } from 'node:crypto';
import type { RequestHandler } from 'express';
import type { Logger } from 'pino';

/**
 * Gives every request an id (answered as `X-Request-Id`) and a pino child logger `req.log` that
 * carries it, made only when something is logged; routine requests are logged at debug level when
 * they finish. pino-http did the same but serialised the whole request into a child logger for
 * every request, even with nothing to log, which cost about a fifth of the throughput of the
 * stateless chemistry routes.
 *
 * @param logger the app's logger
 */
export function requestLog(logger: Logger): RequestHandler {
  return (req, res, next) => {
    const id = randomUUID();
    req.id = id;
    res.setHeader('X-Request-Id', id);
    let child: Logger | undefined;
    Object.defineProperty(req, 'log', {
      configurable: true,
      get: () => (child ??= logger.child({ reqId: id, method: req.method, url: req.originalUrl })),
    });
    if (logger.isLevelEnabled('debug')) {
      const started = performance.now();
      res.on('finish', () => req.log.debug({ status: res.statusCode, ms: Math.round(performance.now() - started) }, 'request answered'));
    }
    next();
  };
}
