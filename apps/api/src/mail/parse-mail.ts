/** What the outbox shows of one received message. */
export interface ParsedMail {
  to: string;
  subject: string;
  text: string;
}

interface MimePart {
  headers: Map<string, string>;
  body: string;
}

/**
 * Reads the recipients, subject and plain-text body of an RFC 5322 message as
 * nodemailer writes it: one `text/plain` part, or a multipart message holding
 * one; 7bit, 8bit, quoted-printable or base64; RFC 2047 encoded-word headers.
 *
 * @param raw the message exactly as received in the SMTP DATA command
 * @example parseMail('To: a@b.example\r\nSubject: Hi\r\n\r\nHello').subject // 'Hi'
 */
export function parseMail(raw: string): ParsedMail {
  const message = splitPart(raw);
  return {
    to: decodeHeader(message.headers.get('to') ?? ''),
    subject: decodeHeader(message.headers.get('subject') ?? ''),
    text: findPlainText(message) ?? '',
  };
}

/** Splits headers (unfolded, names lower-cased) from the body. */
function splitPart(raw: string): MimePart {
  const normalised = raw.replace(/\r\n/g, '\n');
  const end = normalised.indexOf('\n\n');
  const head = end === -1 ? normalised : normalised.slice(0, end);
  const body = end === -1 ? '' : normalised.slice(end + 2);
  const headers = new Map<string, string>();
  for (const line of head.replace(/\n[ \t]+/g, ' ').split('\n')) {
    const colon = line.indexOf(':');
    if (colon > 0) headers.set(line.slice(0, colon).trim().toLowerCase(), line.slice(colon + 1).trim());
  }
  return { headers, body };
}

/** The decoded body of the first text/plain part, depth first. */
function findPlainText(part: MimePart): string | undefined {
  const contentType = part.headers.get('content-type') ?? 'text/plain';
  const mediaType = contentType.split(';')[0]!.trim().toLowerCase();
  if (mediaType.startsWith('multipart/')) {
    const boundary = /boundary="?([^";]+)"?/i.exec(contentType)?.[1];
    if (!boundary) return undefined;
    for (const chunk of part.body.split(`--${boundary}`).slice(1)) {
      if (chunk.startsWith('--')) break;
      const text = findPlainText(splitPart(chunk.replace(/^\n/, '')));
      if (text !== undefined) return text;
    }
    return undefined;
  }
  if (mediaType !== 'text/plain') return undefined;
  const charset = /charset="?([^";]+)"?/i.exec(contentType)?.[1] ?? 'utf-8';
  const encoding = (part.headers.get('content-transfer-encoding') ?? '7bit').toLowerCase();
  return decodeBody(part.body, encoding, charset).replace(/\n$/, '');
}

function decodeBody(body: string, encoding: string, charset: string): string {
  if (encoding === 'base64') return new TextDecoder(charset).decode(Buffer.from(body.replace(/\s+/g, ''), 'base64'));
  if (encoding === 'quoted-printable') {
    // Trailing blanks are transport padding; `=` at a line's end is a soft break.
    const joined = body.replace(/[ \t]+$/gm, '').replace(/=\n/g, '');
    return new TextDecoder(charset).decode(decodeQuotedBytes(joined));
  }
  return body;
}

/** The `=XX` escapes of quoted-printable (RFC 2045 §6.7) and of Q-encoded words, as bytes. */
function decodeQuotedBytes(joined: string): Uint8Array {
  const bytes: number[] = [];
  for (let index = 0; index < joined.length; index++) {
    const hex = joined.slice(index + 1, index + 3);
    if (joined[index] === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      index += 2;
    } else {
      bytes.push(...Buffer.from(joined[index]!, 'utf8'));
    }
  }
  return Uint8Array.from(bytes);
}

/** RFC 2047 encoded words (`=?utf-8?Q?...?=`, `=?utf-8?B?...?=`); whitespace between adjacent words is dropped. */
function decodeHeader(value: string): string {
  return value
    .replace(/(\?=)\s+(=\?)/g, '$1$2')
    .replace(/=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g, (_word, charset: string, kind: string, text: string) => {
      const bytes =
        kind.toUpperCase() === 'B'
          ? Buffer.from(text, 'base64')
          : decodeQuotedBytes(text.replace(/_/g, ' '));
      return new TextDecoder(charset).decode(bytes);
    });
}
