import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';

/** What a reader of the sink needs of a message, parsed once by mailparser when it arrives. */
export interface SinkMail {
  file: string;
  to: string[];
  from: string;
  subject: string;
  kind: string | undefined;
  text: string;
  html: string;
}

const addresses = (to: AddressObject | AddressObject[] | undefined) =>
  (Array.isArray(to) ? to : to ? [to] : []).flatMap((a) => a.value.map((v) => (v.address ?? '').toLowerCase()));

async function summarise(raw: Buffer, file: string): Promise<SinkMail> {
  const m = await simpleParser(raw);
  const kind = m.headers.get('x-asepta-kind');
  return {
    file,
    to: addresses(m.to),
    from: m.from?.text ?? '',
    subject: m.subject ?? '',
    kind: typeof kind === 'string' ? kind : undefined,
    text: (m.text ?? '').replace(/\r\n/g, '\n').replace(/\n$/, ''),
    html: typeof m.html === 'string' ? m.html : '',
  };
}

export interface MailFake {
  port: number;
  sinkDir: string;
  stop(): Promise<void>;
}

/**
 * A local SMTP server that accepts every message and saves it as <timestamp>-<id>.eml in sinkDir, with
 * <timestamp>-<id>.json beside it (its parsed summary), so development and tests can read what the app sent. Loopback only; no TLS and no AUTH, because
 * the package's built-in certificate has expired and nothing here needs either.
 */
export async function startMailFake(options: { port: number; sinkDir: string; host?: string }): Promise<MailFake> {
  const sinkDir = path.resolve(options.sinkDir);
  mkdirSync(sinkDir, { recursive: true });
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS', 'AUTH'],
    authOptional: true,
    logger: false,
    size: 25 * 1024 * 1024,
    onData(stream, _session, callback) {
      const chunks: Buffer[] = [];
      stream.on('data', (c: Buffer) => chunks.push(c));
      stream.on('error', callback);
      stream.on('end', () => {
        const name = `${Date.now()}-${randomBytes(6).toString('hex')}`;
        const raw = Buffer.concat(chunks);
        // The client hears 250 only once both files are on disk, so a test can read them right after sending.
        writeFile(path.join(sinkDir, `${name}.eml`), raw)
          .then(() => summarise(raw, `${name}.eml`))
          .then((mail) => writeFile(path.join(sinkDir, `${name}.json`), JSON.stringify(mail)))
          .then(
            () => callback(),
            (err: Error) => callback(err),
          );
      });
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, options.host ?? '127.0.0.1', () => {
      server.off('error', reject);
      resolve();
    });
  });
  const port = (server.server.address() as AddressInfo).port;
  return {
    port,
    sinkDir,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
