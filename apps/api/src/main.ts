/**
 * Entry point: reads the environment, migrates the database, optionally
 * loads the demo data, starts the fake SMTP server outside production when no
 * SMTP_HOST is set, serves the API and the built client, and shuts down
 * cleanly on SIGINT/SIGTERM. Prints one line when listening; logs go through pino.
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { MikroORM } from '@mikro-orm/postgresql';
import type { Logger } from 'pino';
import { createApp } from './app';
import { loadConfig, type Config } from './config/env';
import { openDatabase } from './db/open-database';
import { createLogger } from './http/create-logger';
import { seedDemo } from './db/seeders/demo-seeder';
import { FakeSmtpServer } from './mail/fake-smtp-server';
import { createSmtpMailer, type Mailer } from './mail/mailer';

/** How long open connections may take to finish once shutdown begins. */
const SHUTDOWN_GRACE_MS = 5_000;

/** The outgoing mail path: a real SMTP server, or the fake one on loopback with its outbox. */
async function startMail(config: Config, logger: Logger): Promise<{ mailer: Mailer; fakeSmtp?: FakeSmtpServer }> {
  if (config.smtp) {
    return { mailer: createSmtpMailer({ ...config.smtp, from: config.mailFrom, isLocalFake: false }) };
  }
  const fakeSmtp = new FakeSmtpServer();
  const port = await fakeSmtp.start(config.fakeSmtpPort);
  logger.debug({ port }, 'fake SMTP server listening on 127.0.0.1');
  return { fakeSmtp, mailer: createSmtpMailer({ host: '127.0.0.1', port, from: config.mailFrom, isLocalFake: true }) };
}

/** Listens on HOST:PORT; Express 5 hands a listen error (such as a port in use) to the callback. */
function listen(app: ReturnType<typeof createApp>, config: Config): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server: Server = app.listen(config.port, config.host, (error?: Error) => (error ? reject(error) : resolve(server)));
  });
}

/** Stops taking requests, lets open ones finish (up to the grace period), then closes mail and database. */
async function stop(server: Server, resources: { orm: MikroORM; mailer: Mailer; fakeSmtp?: FakeSmtpServer }): Promise<void> {
  const closed = new Promise<void>((resolve) => server.close(() => resolve()));
  server.closeIdleConnections();
  const forced = setTimeout(() => server.closeAllConnections(), SHUTDOWN_GRACE_MS);
  await closed;
  clearTimeout(forced);
  resources.mailer.close();
  await resources.fakeSmtp?.stop();
  await resources.orm.close();
}

async function main(): Promise<void> {
  const config = loadConfig();
  const logger = createLogger(config.logLevel);
  const orm = await openDatabase(config);
  if (config.isDemoSeedWanted) logger.debug(await seedDemo(orm.em, config.bcryptCost), 'demo data checked');
  const { mailer, fakeSmtp } = await startMail(config, logger);
  const app = createApp({ config, orm, mailer, logger, outbox: fakeSmtp });
  const server = await listen(app, config);
  console.log(`Tallus API listening on http://${config.host}:${(server.address() as AddressInfo).port}`);

  let isStopping = false;
  const shutdown = (signal: string) => {
    if (isStopping) return;
    isStopping = true;
    logger.debug({ signal }, 'shutting down');
    stop(server, { orm, mailer, fakeSmtp }).then(
      () => process.exit(0),
      (error: unknown) => {
        logger.error({ err: error }, 'unclean shutdown');
        process.exit(1);
      },
    );
  };
  process.on('SIGINT', () => shutdown('SIGINT'));
  process.on('SIGTERM', () => shutdown('SIGTERM'));
}

main().catch((error: unknown) => {
  console.error(`Tallus API failed to start: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
