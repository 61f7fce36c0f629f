import { config } from '../server/core/config';
import { isPortFree } from './free-port';
import { startMailFake, type MailFake } from './mail-fake';

/**
 * npm start and dev: when mail points at this machine, run the SMTP fake there and keep every
 * message under MAIL_SINK_DIR. A real relay (SMTP_HOST elsewhere) is left alone.
 */
export async function startLocalMailFake(): Promise<MailFake | undefined> {
  const c = config();
  if (c.SMTP_HOST !== '127.0.0.1' && c.SMTP_HOST !== 'localhost') return undefined;
  if (!(await isPortFree(c.SMTP_PORT))) {
    console.log(`Mail: port ${c.SMTP_PORT} is already in use; sending to whatever listens there.`);
    return undefined;
  }
  const fake = await startMailFake({ port: c.SMTP_PORT, sinkDir: c.MAIL_SINK_DIR });
  console.log(`Mail: local SMTP fake on 127.0.0.1:${fake.port}, messages saved in ${fake.sinkDir}`);
  return fake;
}
