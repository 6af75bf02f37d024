import type { AddressInfo } from 'node:net';
import type { OutboxMessage } from '@tallus/contracts';
import { SMTPServer } from 'smtp-server';
import { parseMail } from './parse-mail';

/** Messages kept at most; older ones are dropped first. */
const OUTBOX_CAPACITY = 500;
/** Largest message accepted, in bytes. */
const MAX_MESSAGE_BYTES = 1_000_000;

/**
 * A local SMTP server for development and tests: listens on loopback only,
 * accepts any sender and recipient without authentication or TLS, and keeps
 * what it receives in memory (the outbox). Nothing is ever relayed.
 */
export class FakeSmtpServer {
  private readonly received: OutboxMessage[] = [];
  private readonly server: SMTPServer;
  private listeningPort = 0;

  constructor() {
    this.server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      logger: false,
      size: MAX_MESSAGE_BYTES,
      closeTimeout: 1_000,
      onData: (stream, _session, callback) => {
        const chunks: Buffer[] = [];
        stream.on('data', (chunk: Buffer) => chunks.push(chunk));
        stream.on('error', callback);
        stream.on('end', () => {
          this.keep(Buffer.concat(chunks).toString('utf8'));
          callback();
        });
      },
    });
  }

  /**
   * Starts listening on 127.0.0.1.
   *
   * @param port TCP port; 0 (default) picks a free one
   * @returns the port in use
   */
  start(port = 0): Promise<number> {
    return new Promise((resolve, reject) => {
      this.server.once('error', reject);
      this.server.listen(port, '127.0.0.1', () => {
        this.server.off('error', reject);
        this.listeningPort = (this.server.server.address() as AddressInfo).port;
        resolve(this.listeningPort);
      });
    });
  }

  /** Port in use; 0 before {@link start}. */
  get port(): number {
    return this.listeningPort;
  }

  /** Received messages, newest first. */
  messages(): OutboxMessage[] {
    return [...this.received].reverse();
  }

  /** Stops listening and closes open connections. */
  stop(): Promise<void> {
    return new Promise((resolve) => this.server.close(() => resolve()));
  }

  private keep(raw: string): void {
    this.received.push({ ...parseMail(raw), sentAt: new Date().toISOString() });
    if (this.received.length > OUTBOX_CAPACITY) this.received.shift();
  }
}
