import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FakeSmtpServer } from './fake-smtp-server';
import { createSmtpMailer, type Mailer } from './mailer';

describe('FakeSmtpServer with the SMTP mailer', () => {
  const server = new FakeSmtpServer();
  let mailer: Mailer;

  beforeAll(async () => {
    const port = await server.start(0);
    mailer = createSmtpMailer({ host: '127.0.0.1', port, from: 'Tallus <no-reply@tallus.example>', isLocalFake: true });
  });

  afterAll(async () => {
    mailer.close();
    await server.stop();
  });

  it('When two messages are sent over SMTP, then the outbox holds both, newest first', async () => {
    await mailer.send({ to: 'first@kestrel.example', subject: 'First', text: 'one' });
    await mailer.send({ to: 'second@kestrel.example', subject: 'Second', text: 'two' });

    const messages = server.messages();

    expect(server.port).toBeGreaterThan(0);
    expect(messages.map((message) => [message.to, message.subject, message.text])).toEqual([
      ['second@kestrel.example', 'Second', 'two'],
      ['first@kestrel.example', 'First', 'one'],
    ]);
    expect(Number.isNaN(Date.parse(messages[0]!.sentAt))).toBe(false);
  });
});
