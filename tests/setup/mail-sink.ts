import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { inject } from 'vitest';
import { onMailSettled, type SettledMail } from '../../server/mail/mailer';

export interface SinkMail {
  file: string;
  to: string[];
  from: string;
  subject: string;
  kind: string | undefined;
  text: string;
  html: string;
}

declare module 'vitest' {
  export interface ProvidedContext {
    mailSinkDir: string;
    mailPort: number;
  }
}

function decodeWords(value: string): string {
  return value.replace(
    /=\?([^?]+)\?([QqBb])\?([^?]*)\?=(\s+(?==\?))?/g,
    (_m, _charset: string, enc: string, data: string) => {
      if (enc.toUpperCase() === 'B') return Buffer.from(data, 'base64').toString('utf8');
      const bytes = data
        .replace(/_/g, ' ')
        .replace(/=([0-9A-Fa-f]{2})/g, (_x, h: string) => String.fromCharCode(parseInt(h, 16)));
      return Buffer.from(bytes, 'latin1').toString('utf8');
    },
  );
}

function parseHeaders(block: string): Map<string, string> {
  const headers = new Map<string, string>();
  for (const line of block
    .replace(/\r\n/g, '\n')
    .replace(/\n[ \t]+/g, ' ')
    .split('\n')) {
    const i = line.indexOf(':');
    if (i > 0) headers.set(line.slice(0, i).trim().toLowerCase(), line.slice(i + 1).trim());
  }
  return headers;
}

function decodeBody(body: string, encoding: string | undefined): string {
  const enc = (encoding ?? '7bit').toLowerCase();
  if (enc === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  if (enc === 'quoted-printable') {
    const bytes = body
      .replace(/=\r?\n/g, '')
      .replace(/=([0-9A-Fa-f]{2})/g, (_x, h: string) => String.fromCharCode(parseInt(h, 16)));
    return Buffer.from(bytes, 'latin1').toString('utf8');
  }
  return body;
}

function split(raw: string): [string, string] {
  const at = raw.search(/\r?\n\r?\n/);
  if (at < 0) return [raw, ''];
  return [raw.slice(0, at), raw.slice(at).replace(/^\r?\n\r?\n/, '')];
}

/** Enough of RFC 5322/2045 for what nodemailer writes: one multipart/alternative of text and HTML. */
export function parseEml(raw: string, file = ''): SinkMail {
  const [head, body] = split(raw);
  const h = parseHeaders(head);
  const mail: SinkMail = {
    file,
    to: (h.get('to') ?? '')
      .split(',')
      .map((a) => (/<([^>]+)>/.exec(a)?.[1] ?? a).trim().toLowerCase())
      .filter(Boolean),
    from: decodeWords(h.get('from') ?? ''),
    subject: decodeWords(h.get('subject') ?? ''),
    kind: h.get('x-asepta-kind'),
    text: '',
    html: '',
  };
  const boundary = /boundary="?([^";]+)"?/i.exec(h.get('content-type') ?? '')?.[1];
  const parts = boundary ? body.split(`--${boundary}`).slice(1, -1) : [raw];
  for (const part of parts) {
    const [ph, pb] = boundary ? split(part.replace(/^\r?\n/, '')) : [head, body];
    const p = parseHeaders(ph);
    const decoded = decodeBody(pb.replace(/\r?\n$/, ''), p.get('content-transfer-encoding'));
    if ((p.get('content-type') ?? '').startsWith('text/html')) mail.html = decoded;
    else mail.text = decoded.replace(/\r\n/g, '\n');
  }
  return mail;
}

export const mailSinkDir = () => inject('mailSinkDir');

/** Every message the test mail fake has saved, oldest first (file names start with a timestamp). */
export function readMailSink(dir = mailSinkDir()): SinkMail[] {
  let files: string[];
  try {
    files = readdirSync(dir).filter((f) => f.endsWith('.eml'));
  } catch {
    return [];
  }
  return files.sort().map((f) => parseEml(readFileSync(path.join(dir, f), 'utf8'), f));
}

export const mailsTo = (address: string, mails = readMailSink()) =>
  mails.filter((m) => m.to.includes(address.toLowerCase()));

/**
 * Resolves once the app has sent (or failed to send) a matching message: an event, not a poll
 * against the clock. Call it before the action that sends, so the event cannot be missed.
 */
export function mailSettled(match: (m: SettledMail) => boolean): Promise<SettledMail> {
  return new Promise((resolve) => {
    const off = onMailSettled((m) => {
      if (!match(m)) return;
      off();
      resolve(m);
    });
  });
}

/** Messages in the sink that match; the fake writes each file before it answers the app. */
export const mailsWhere = (match: (m: SinkMail) => boolean) => readMailSink().filter(match);
