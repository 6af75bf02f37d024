import nodemailer, { type Transporter } from 'nodemailer';

/** One plain-text e-mail. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
}

/** Sends e-mail; use cases get one through the app's dependencies. */
export interface Mailer {
  /** Hands the message to the SMTP server; rejects when the server refuses it or cannot be reached. */
  send(message: MailMessage): Promise<void>;
  /** Closes pooled connections. */
  close(): void;
}

/** Where and how to send. */
export interface SmtpMailerOptions {
  host: string;
  port: number;
  user?: string;
  password?: string;
  /** Sender address, e.g. `Tallus <no-reply@tallus.example>`. */
  from: string;
  /** Whether the server is the local fake one: no TLS negotiation, short time-outs. */
  isLocalFake: boolean;
}

/**
 * A {@link Mailer} that speaks SMTP through nodemailer.
 *
 * @param options server, credentials and sender
 */
export function createSmtpMailer(options: SmtpMailerOptions): Mailer {
  const transport: Transporter = nodemailer.createTransport({
    host: options.host,
    port: options.port,
    secure: options.port === 465,
    ignoreTLS: options.isLocalFake,
    auth: options.user ? { user: options.user, pass: options.password ?? '' } : undefined,
    connectionTimeout: options.isLocalFake ? 5_000 : 30_000,
    greetingTimeout: options.isLocalFake ? 5_000 : 30_000,
  });
  return {
    async send(message) {
      await transport.sendMail({ from: options.from, to: message.to, subject: message.subject, text: message.text });
    },
    close() {
      transport.close();
    },
  };
}
