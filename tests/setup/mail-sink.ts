import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { inject } from 'vitest';
import type { SinkMail } from '../../scripts/mail-fake';
import { onMailSettled, type SettledMail } from '../../server/mail/mailer';

export type { SinkMail };

declare module 'vitest' {
  export interface ProvidedContext {
    mailSinkDir: string;
    mailPort: number;
  }
}

export const mailSinkDir = () => inject('mailSinkDir');

/** Every message the test mail fake has saved, oldest first (file names start with a timestamp). */
export function readMailSink(dir = mailSinkDir()): SinkMail[] {
  let files: string[];
  try {
    files = readdirSync(dir).filter((f) => f.endsWith('.json'));
  } catch {
    return [];
  }
  return files.sort().map((f) => JSON.parse(readFileSync(path.join(dir, f), 'utf8')) as SinkMail);
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
