import { config } from '../core/config';
import { logger } from '../core/logger';
import { mailRepository, type Recipient } from './mail.repository';
import { mailTransport } from './mail-transport';
import type { MailKind } from '../../shared/enums';

export interface MailContent {
  subject: string;
  text: string;
  html: string;
}

/** One message after its SMTP exchange and its sent_mails row. */
export interface SettledMail {
  kind: MailKind;
  to: string;
  subject: string;
  status: 'sent' | 'failed';
}

const settledListeners = new Set<(mail: SettledMail) => void>();

/** Lets a caller wait on a delivery instead of polling for it; answers an unsubscribe function. */
export function onMailSettled(listener: (mail: SettledMail) => void): () => void {
  settledListeners.add(listener);
  return () => settledListeners.delete(listener);
}

export interface DeliveryResult {
  sent: number;
  failed: number;
}

/**
 * Sends one message per recipient and records each in sent_mails. Called after the writing
 * transaction has committed; an SMTP failure is logged and recorded, never thrown at the caller.
 */
export async function deliver(kind: MailKind, recipients: Recipient[], content: MailContent): Promise<DeliveryResult> {
  const result: DeliveryResult = { sent: 0, failed: 0 };
  for (const r of recipients) {
    let messageId: string | null = null;
    let error: string | null = null;
    try {
      // nodemailer types the answer as any; SMTP transports give the message id.
      const info = (await mailTransport().sendMail({
        from: config().SMTP_FROM,
        to: { name: r.displayName, address: r.email },
        subject: content.subject,
        text: content.text,
        html: content.html,
        headers: { 'X-Asepta-Kind': kind },
      })) as { messageId: string };
      messageId = info.messageId;
    } catch (err) {
      error = err instanceof Error ? err.message : String(err);
      logger.warn({ err, kind, to: r.email }, 'mail could not be sent');
    }
    try {
      await mailRepository.insertSent({
        kind,
        toUserId: r.userId,
        toAddress: r.email,
        subject: content.subject.slice(0, 300),
        textBody: content.text,
        status: error ? 'failed' : 'sent',
        error: error?.slice(0, 1000) ?? null,
        messageId: messageId?.slice(0, 250) ?? null,
      });
    } catch (err) {
      logger.error({ err, kind, to: r.email }, 'sent mail could not be recorded');
    }
    if (error) result.failed += 1;
    else result.sent += 1;
    const settled: SettledMail = { kind, to: r.email, subject: content.subject, status: error ? 'failed' : 'sent' };
    for (const listener of settledListeners) listener(settled);
  }
  return result;
}
