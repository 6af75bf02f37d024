import nodemailer from 'nodemailer';
import { describe, expect, it } from 'vitest';
import { parseMail } from './parse-mail';

/** The raw message nodemailer would send, without any network. */
async function compose(message: { to: string; subject: string; text: string; html?: string }): Promise<string> {
  const transport = nodemailer.createTransport({ streamTransport: true, buffer: true, newline: 'windows' });
  const info = await transport.sendMail({ from: 'Tallus <no-reply@tallus.example>', ...message });
  return String(info.message);
}

describe('parseMail', () => {
  it('When the message is plain ASCII, then recipient, subject and text come back unchanged', async () => {
    const raw = await compose({ to: 'viewer@kestrel.example', subject: 'Join Kestrel Flats', text: 'Open http://127.0.0.1:4300/x?token=abc' });

    expect(parseMail(raw)).toEqual({
      to: 'viewer@kestrel.example',
      subject: 'Join Kestrel Flats',
      text: 'Open http://127.0.0.1:4300/x?token=abc',
    });
  });

  it('When subject and text hold non-ASCII and long lines, then they are decoded exactly', async () => {
    const text = `Fe²⁺ → Fe³⁺ oxidation at Ōtautahi; ${'long line '.repeat(20)}\nlink=http://127.0.0.1/a?token=${'Zz_-'.repeat(12)}`;
    const raw = await compose({ to: 'editor@ironbark.example', subject: 'Einladung für Ironbark Creek — Ōtautahi', text });

    const parsed = parseMail(raw);

    expect(parsed.subject).toBe('Einladung für Ironbark Creek — Ōtautahi');
    expect(parsed.text).toBe(text);
  });

  it('When the message also has an HTML part, then the plain-text part is returned', async () => {
    const raw = await compose({ to: 'a@b.example', subject: 'Both', text: 'plain body', html: '<p>html body</p>' });

    expect(parseMail(raw).text).toBe('plain body');
  });

  it('When the message is base64-encoded, then the text is decoded', () => {
    const raw = ['To: a@b.example', 'Subject: =?UTF-8?B?w4RyZ2Vy?=', 'Content-Type: text/plain; charset=utf-8', 'Content-Transfer-Encoding: base64', '', Buffer.from('Grüße').toString('base64')].join('\r\n');

    expect(parseMail(raw)).toEqual({ to: 'a@b.example', subject: 'Ärger', text: 'Grüße' });
  });
});
