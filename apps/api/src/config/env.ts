import { z } from 'zod';

/** Secret used to sign tokens outside production when JWT_SECRET is not set. Never valid in production. */
const DEVELOPMENT_JWT_SECRET = 'tallus-development-only-secret-do-not-use-in-production';

/** A duration as jsonwebtoken reads it: seconds (`3600`) or a number with a unit (`45m`, `8h`, `7d`). */
const durationSchema = z.string().regex(/^\d+(s|m|h|d)?$/, 'Use seconds or a number with s, m, h or d, e.g. 8h');

const port = (fallback: number) => z.coerce.number().int().min(0).max(65_535).default(fallback);

/**
 * Every environment variable the API reads, with its default. Parsed once at
 * start-up by {@link loadConfig}; a bad value stops the process with the key's name.
 */
const envSchema = z.object({
  /** `development` (default), `test` or `production`. Development and test start the fake SMTP server and expose `/api/dev/outbox`. */
  NODE_ENV: z.enum(['development', 'test', 'production']).default('development'),
  /** Interface to listen on. Default 127.0.0.1 (loopback only). */
  HOST: z.string().min(1).default('127.0.0.1'),
  /** Port to listen on. Default 4300; 0 picks a free one. */
  PORT: port(4300),
  /** PostgreSQL host. Default 127.0.0.1 (the project-local cluster of docker-less-db/). */
  TALLUS_DB_HOST: z.string().min(1).default('127.0.0.1'),
  /** PostgreSQL port. Default 54320. */
  TALLUS_DB_PORT: port(54320),
  /** Database name. Default `tallus`; the tests use `tallus_test`. */
  TALLUS_DB_NAME: z.string().min(1).default('tallus'),
  /** Database user. Default `tallus`. */
  TALLUS_DB_USER: z.string().min(1).default('tallus'),
  /** Database password. Default `tallus-local-only` (the local cluster's). */
  TALLUS_DB_PASSWORD: z.string().default('tallus-local-only'),
  /** HS256 signing secret of the session tokens, at least 32 characters. Required in production; a fixed development secret otherwise. */
  JWT_SECRET: z.string().min(32).optional(),
  /** Lifetime of a session token: seconds or e.g. `45m`, `8h`, `7d`. Default 8h. */
  JWT_TTL: durationSchema.default('8h'),
  /** bcrypt cost factor of password hashes, 10 to 15. Default 12. */
  BCRYPT_COST: z.coerce.number().int().min(10).max(15).default(12),
  /** Failed sign-in attempts (and registrations) allowed per IP address and e-mail address in one window. Default 10. */
  AUTH_RATE_LIMIT_MAX: z.coerce.number().int().min(1).default(10),
  /** Length of the rate-limit window in minutes. Default 15. */
  AUTH_RATE_LIMIT_WINDOW_MINUTES: z.coerce.number().int().min(1).default(15),
  /** Seconds a checked session token is trusted without the database look-ups; sign-out in the same process ends it at once. 0 turns the cache off. Default 30. */
  SESSION_CACHE_SECONDS: z.coerce.number().int().min(0).max(300).default(30),
  /** Requests per user per minute to the stateless `/api/chem/*` routes; 0 turns the limit off (the benchmark does). Default 600. */
  CHEM_RATE_LIMIT_PER_MINUTE: z.coerce.number().int().min(0).default(600),
  /** SMTP server for outgoing mail. When unset outside production, the API starts its own fake SMTP server on loopback. Required in production. */
  SMTP_HOST: z.string().min(1).optional(),
  /** SMTP port. With SMTP_HOST: default 587. For the fake server: its port (default 0, a free one). */
  SMTP_PORT: z.coerce.number().int().min(0).max(65_535).optional(),
  /** SMTP user name, when the server wants a login. */
  SMTP_USER: z.string().min(1).optional(),
  /** SMTP password, with SMTP_USER. */
  SMTP_PASSWORD: z.string().optional(),
  /** Sender of every e-mail. Default `Tallus <no-reply@tallus.example>`. */
  MAIL_FROM: z.string().min(3).default('Tallus <no-reply@tallus.example>'),
  /** Origin the client is reached at; invitation links start with it. Default http://127.0.0.1:<PORT>. */
  PUBLIC_ORIGIN: z.url().optional(),
  /** Folder of the built client, served with an SPA fallback. Default dist/web/browser (relative to the working directory). */
  WEB_DIST: z.string().min(1).default('dist/web/browser'),
  /** pino log level: fatal, error, warn, info (default), debug, trace or silent. */
  LOG_LEVEL: z.enum(['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent']).default('info'),
  /** `1` makes main.ts load the invented demo teams of DESIGN.md §6 at start-up (idempotent). */
  TALLUS_SEED_DEMO: z.enum(['0', '1']).default('0'),
});

/** The API's settings, parsed from the environment. */
export interface Config {
  nodeEnv: 'development' | 'test' | 'production';
  host: string;
  port: number;
  database: { host: string; port: number; name: string; user: string; password: string };
  jwt: { secret: string; ttl: string };
  bcryptCost: number;
  authRateLimit: { max: number; windowMs: number };
  /** Requests per user per minute to `/api/chem/*`; 0: no limit. */
  chemRateLimitPerMinute: number;
  /** How long (ms) a checked session token is trusted without database look-ups; 0: always look up. */
  sessionCacheMs: number;
  /** Real SMTP server; absent when the fake one should run. */
  smtp?: { host: string; port: number; user?: string; password?: string };
  /** Port of the fake SMTP server (0 = any free one). */
  fakeSmtpPort: number;
  mailFrom: string;
  publicOrigin: string;
  webDist: string;
  logLevel: string;
  isDemoSeedWanted: boolean;
}

/**
 * Parses the environment into a {@link Config}.
 *
 * @param env the variables to read; defaults to `process.env`
 * @throws Error naming each bad key, e.g. a missing JWT_SECRET in production
 */
export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const parsed = envSchema.safeParse(withoutEmptyValues(env));
  if (!parsed.success) {
    const lines = parsed.error.issues.map((issue) => `${issue.path.join('.')}: ${issue.message}`);
    throw new Error(`Invalid environment:\n  ${lines.join('\n  ')}`);
  }
  const values = parsed.data;
  const isProduction = values.NODE_ENV === 'production';
  if (isProduction && !values.JWT_SECRET) throw new Error('Invalid environment:\n  JWT_SECRET: required in production');
  if (isProduction && !values.SMTP_HOST) throw new Error('Invalid environment:\n  SMTP_HOST: required in production');
  return {
    nodeEnv: values.NODE_ENV,
    host: values.HOST,
    port: values.PORT,
    database: {
      host: values.TALLUS_DB_HOST,
      port: values.TALLUS_DB_PORT,
      name: values.TALLUS_DB_NAME,
      user: values.TALLUS_DB_USER,
      password: values.TALLUS_DB_PASSWORD,
    },
    jwt: { secret: values.JWT_SECRET ?? DEVELOPMENT_JWT_SECRET, ttl: values.JWT_TTL },
    bcryptCost: values.BCRYPT_COST,
    authRateLimit: { max: values.AUTH_RATE_LIMIT_MAX, windowMs: values.AUTH_RATE_LIMIT_WINDOW_MINUTES * 60_000 },
    chemRateLimitPerMinute: values.CHEM_RATE_LIMIT_PER_MINUTE,
    sessionCacheMs: values.SESSION_CACHE_SECONDS * 1000,
    smtp: values.SMTP_HOST
      ? { host: values.SMTP_HOST, port: values.SMTP_PORT ?? 587, user: values.SMTP_USER, password: values.SMTP_PASSWORD }
      : undefined,
    fakeSmtpPort: values.SMTP_HOST ? 0 : (values.SMTP_PORT ?? 0),
    mailFrom: values.MAIL_FROM,
    publicOrigin: (values.PUBLIC_ORIGIN ?? `http://127.0.0.1:${values.PORT}`).replace(/\/+$/, ''),
    webDist: values.WEB_DIST,
    logLevel: values.LOG_LEVEL,
    isDemoSeedWanted: values.TALLUS_SEED_DEMO === '1',
  };
}

/** Treats `KEY=` like an unset key, as shells and .env files often leave them. */
function withoutEmptyValues(env: NodeJS.ProcessEnv): Record<string, string> {
  return Object.fromEntries(Object.entries(env).filter((entry): entry is [string, string] => entry[1] !== undefined && entry[1] !== ''));
}
