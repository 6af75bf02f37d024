import { MikroORM } from '@mikro-orm/postgresql';
import type { Express } from 'express';
import { pino } from 'pino';
import request from 'supertest';
import { createApp } from '../../../apps/api/src/app';
import { loadConfig, type Config } from '../../../apps/api/src/config/env';
import { createOrmOptions } from '../../../apps/api/src/db/mikro-orm.config';
import { FakeSmtpServer } from '../../../apps/api/src/mail/fake-smtp-server';
import { createSmtpMailer, type Mailer } from '../../../apps/api/src/mail/mailer';
import { blockOutgoingNetwork } from './block-network';
import { testEnvironment } from './test-environment';

blockOutgoingNetwork();

/** One app per spec file: its own rate-limit counts, its own fake SMTP server and outbox. */
export interface TestApp {
  app: Express;
  config: Config;
  orm: MikroORM;
  smtp: FakeSmtpServer;
  close(): Promise<void>;
}

/**
 * Builds the real app in-process on the migrated test database, with a fake
 * SMTP server on an ephemeral loopback port.
 *
 * @param overrides environment variables on top of {@link testEnvironment}
 */
export async function startTestApp(overrides: Record<string, string> = {}): Promise<TestApp> {
  const config = loadConfig(testEnvironment(overrides));
  const orm = await MikroORM.init(createOrmOptions(config));
  const smtp = new FakeSmtpServer();
  const port = await smtp.start(0);
  const mailer: Mailer = createSmtpMailer({ host: '127.0.0.1', port, from: config.mailFrom, isLocalFake: true });
  const app = createApp({ config, orm, mailer, logger: pino({ level: 'silent' }), outbox: smtp });
  return {
    app,
    config,
    orm,
    smtp,
    async close() {
      mailer.close();
      await smtp.stop();
      await orm.close();
    },
  };
}

/** A registered user and their bearer token. */
export interface SignedInUser {
  id: string;
  email: string;
  displayName: string;
  token: string;
  /** `Authorization` header value. */
  auth: string;
}

let userCounter = 0;

/** A fresh, unused e-mail address; tests share one database, so every user is new. */
export function uniqueEmail(label = 'user'): string {
  userCounter++;
  return `${label}-${Date.now().toString(36)}-${process.pid}-${userCounter}@tests.example`;
}

/** The password every test user gets. */
export const TEST_PASSWORD = 'correct-horse-battery';

/** Registers a new user through the API. */
export async function registerUser(app: Express, label = 'user'): Promise<SignedInUser> {
  const email = uniqueEmail(label);
  const response = await request(app)
    .post('/api/auth/register')
    .send({ email, password: TEST_PASSWORD, displayName: `Test ${label}` })
    .expect(201);
  const { token, user } = response.body as { token: string; user: { id: string; email: string; displayName: string } };
  return { ...user, token, auth: `Bearer ${token}` };
}

/** Creates a team through the API, owned by `owner`. */
export async function createTeam(app: Express, owner: SignedInUser, name = 'Test Team'): Promise<string> {
  const response = await request(app).post('/api/teams').set('Authorization', owner.auth).send({ name }).expect(201);
  return (response.body as { id: string }).id;
}

/**
 * Puts `member` into the team with `role` directly in the database, so a test
 * can arrange members without the invitation round-trip (which has its own spec).
 */
export async function addMember(testApp: TestApp, teamId: string, member: SignedInUser, role: string): Promise<void> {
  await testApp.orm.em
    .fork()
    .getConnection()
    .execute('insert into memberships (id, created_at, team_id, user_id, role) values (gen_random_uuid(), now(), ?, ?, ?)', [teamId, member.id, role]);
}
