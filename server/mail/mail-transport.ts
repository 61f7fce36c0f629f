import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '../core/config';

let transport: Transporter | undefined;

/** One pooled-by-nodemailer transport per process, built from the SMTP_* settings on first use. */
export function mailTransport(): Transporter {
  const c = config();
  transport ??= nodemailer.createTransport({
    host: c.SMTP_HOST,
    port: c.SMTP_PORT,
    secure: false,
    // The local fake offers no TLS; a real relay on port 587 still upgrades when it offers STARTTLS.
    ignoreTLS: c.SMTP_HOST === '127.0.0.1' || c.SMTP_HOST === 'localhost',
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 20_000,
  });
  return transport;
}

export function closeMailTransport(): void {
  transport?.close();
  transport = undefined;
}
