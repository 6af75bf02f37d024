/**
 * Entry point: reads the environment, migrates the database, optionally
 * loads the demo data, starts the fake SMTP server outside production when no
 * SMTP_HOST is set, serves the API and the built client, and shuts down
 * cleanly on SIGINT/SIGTERM.
 */
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { pino } from 'pino';
import { createApp } from './app';
import { loadConfig } from './config/env';
import { openDatabase } from './db/open-database';
import { seedDemo } from './db/seeders/demo-seeder';
import { FakeSmtpServer } from './mail/fake-smtp-server';
import { createSmtpMailer } from './mail/mailer';

/** How long open connections may take to finish once shutdown begins. */
const SHUTDOWN_GRACE_MS = 5_000;

const config = loadConfig();
const logger = pino({ level: config.logLevel });
const orm = await openDatabase(config);
if (config.isDemoSeedWanted) {
  const seeded = await seedDemo(orm.em, config.bcryptCost);
  logger.debug(seeded, 'demo data checked');
}

const fakeSmtp = config.smtp ? undefined : new FakeSmtpServer();
const smtpPort = fakeSmtp ? await fakeSmtp.start(config.fakeSmtpPort) : config.smtp!.port;
if (fakeSmtp) logger.debug({ port: smtpPort }, 'fake SMTP server listening on 127.0.0.1');
const mailer = createSmtpMailer({
  host: config.smtp?.host ?? '127.0.0.1',
  port: smtpPort,
  user: config.smtp?.user,
  password: config.smtp?.password,
  from: config.mailFrom,
  isLocalFake: !config.smtp,
});

const app = createApp({ config, orm, mailer, logger, outbox: fakeSmtp });
// Express 5 hands a listen error (such as a port in use) to this callback.
const server: Server = app.listen(config.port, config.host, (error?: Error) => {
  if (error) {
    console.error(`Tallus API cannot listen on ${config.host}:${config.port}: ${error.message}`);
    process.exit(1);
  }
  const { port } = server.address() as AddressInfo;
  console.log(`Tallus API listening on http://${config.host}:${port}`);
});

let isStopping = false;
async function shutdown(signal: string): Promise<void> {
  if (isStopping) return;
  isStopping = true;
  logger.debug({ signal }, 'shutting down');
  const closed = new Promise<void>((resolve) => server.close(() => resolve()));
  server.closeIdleConnections();
  const forced = setTimeout(() => server.closeAllConnections(), SHUTDOWN_GRACE_MS);
  await closed;
  clearTimeout(forced);
  mailer.close();
  await fakeSmtp?.stop();
  await orm.close();
  process.exit(0);
}
process.on('SIGINT', () => void shutdown('SIGINT'));
process.on('SIGTERM', () => void shutdown('SIGTERM'));
