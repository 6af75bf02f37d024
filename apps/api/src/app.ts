import { RequestContext } from '@mikro-orm/core';
import type { MikroORM } from '@mikro-orm/postgresql';
import express, { type Express } from 'express';
import type { Logger } from 'pino';
import { activityRoutes } from './audit/routes';
import { authRoutes } from './auth/routes';
import { chemRoutes } from './chem/routes';
import { requireUser } from './auth/require-user';
import { SessionCache } from './auth/session-cache';
import type { Config } from './config/env';
import { devRoutes, type OutboxSource } from './dev/routes';
import { NotFoundError } from './errors/app-errors';
import { healthRoutes } from './health/routes';
import { errorHandler } from './http/error-handler';
import { requestLog } from './http/request-log';
import { securityHeaders } from './http/security-headers';
import { serveClient } from './http/serve-client';
import { acceptInvitationRoutes, teamInvitationRoutes } from './invitations/routes';
import { libraryRoutes } from './library/routes';
import { reactionSetRoutes } from './reaction-sets/routes';
import { reviewRoutes } from './review/routes';
import { speciesRoutes } from './species/routes';
import { transferRoutes } from './transfer/routes';
import type { Mailer } from './mail/mailer';
import { teamRoutes } from './teams/routes';
import { teamSettingsRoutes } from './team-settings/routes';
import { waterAnalysisRoutes } from './water-analyses/routes';
import { massBalanceRoutes } from './mass-balance/routes';
import { rockSampleRoutes } from './rock-samples/routes';
import { mineralFormulaRoutes } from './mineral-formulas/routes';
import { reportRoutes } from './reports/routes';

/** Everything the app needs from outside; main.ts and the tests build these. */
export interface AppDependencies {
  config: Config;
  orm: MikroORM;
  mailer: Mailer;
  logger: Logger;
  /** The fake SMTP server's messages; `/api/dev/outbox` exists only with one and outside production. */
  outbox?: OutboxSource;
}

/**
 * Builds the Express app: security headers, request logs, JSON bodies, a
 * MikroORM context per request, the API under `/api`, problem bodies for
 * errors, and the built client (when `config.webDist` holds one). Never listens.
 */
export function createApp(deps: AppDependencies): Express {
  const { config, orm, mailer, logger } = deps;
  const em = orm.em;
  const sessions = new SessionCache(config.sessionCacheMs);
  const authenticated = requireUser(em, config.jwt.secret, sessions);
  const app = express();
  app.disable('x-powered-by');
  app.use(securityHeaders());
  app.use(requestLog(logger));
  app.use(express.json({ limit: '1mb' }));
  app.use((_req, _res, next) => RequestContext.create(orm.em, next));

  const api = express.Router();
  api.use('/health', healthRoutes(em));
  api.use('/auth', authRoutes({ em, config, requireUser: authenticated, sessions }));
  api.use('/teams/:teamId/invitations', teamInvitationRoutes({ em, mailer, requireUser: authenticated, publicOrigin: config.publicOrigin }));
  api.use('/teams/:teamId/activity', activityRoutes(em, authenticated));
  api.use('/chem', chemRoutes(authenticated, config.chemRateLimitPerMinute));
  // Routes with full paths under /api; each route carries its own requireUser, so unknown paths still answer 404.
  api.use(speciesRoutes(em, authenticated));
  api.use(transferRoutes(em, authenticated));
  api.use(reactionSetRoutes(em, authenticated));
  api.use(reviewRoutes({ em, mailer, requireUser: authenticated, publicOrigin: config.publicOrigin }));
  api.use(libraryRoutes(em, authenticated));
  // Site data (issues 6 and 7).
  api.use(teamSettingsRoutes(em, authenticated));
  api.use(waterAnalysisRoutes(em, authenticated));
  api.use(massBalanceRoutes(em, authenticated));
  api.use(rockSampleRoutes(em, authenticated));
  api.use(mineralFormulaRoutes(em, authenticated));
  api.use(reportRoutes(em, authenticated));
  api.use('/teams', teamRoutes({ em, requireUser: authenticated }));
  api.use('/invitations', acceptInvitationRoutes({ em, requireUser: authenticated }));
  if (deps.outbox && config.nodeEnv !== 'production') api.use('/dev', devRoutes(deps.outbox, authenticated));
  api.use(() => {
    throw new NotFoundError('NOT_FOUND', 'No such API route.');
  });
  app.use('/api', api);

  const client = serveClient(config.webDist);
  if (client) app.use(client);
  app.use(() => {
    throw new NotFoundError('NOT_FOUND', 'Nothing here.');
  });
  app.use(errorHandler);
  return app;
}
