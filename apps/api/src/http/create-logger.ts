import { pino, type DestinationStream, type Logger } from 'pino';

/**
 * The app's pino logger. Credentials never reach the logs: the Authorization
 * and Cookie headers of logged requests are redacted (bodies are not logged).
 *
 * @param level pino level, e.g. `info` or `silent`
 * @param destination where lines go; standard output by default
 */
export function createLogger(level: string, destination?: DestinationStream): Logger {
  const options = {
    level,
    redact: { paths: ['req.headers.authorization', 'req.headers.cookie', 'res.headers["set-cookie"]'], censor: '[redacted]' },
  };
  return destination ? pino(options, destination) : pino(options);
}
