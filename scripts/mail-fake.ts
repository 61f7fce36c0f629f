import { randomBytes } from 'node:crypto';
import { mkdirSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { SMTPServer } from 'smtp-server';

export interface MailFake {
  port: number;
  sinkDir: string;
  stop(): Promise<void>;
}

/**
 * A local SMTP server that accepts every message and saves it as <timestamp>-<id>.eml in sinkDir,
 * so development and tests can read what the app sent. Loopback only; no TLS and no AUTH, because
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
        const file = path.join(sinkDir, `${Date.now()}-${randomBytes(6).toString('hex')}.eml`);
        // The client hears 250 only once the file is on disk, so a test can read it right after sending.
        writeFile(file, Buffer.concat(chunks)).then(
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
