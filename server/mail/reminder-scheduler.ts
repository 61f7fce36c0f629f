import { logger } from '../core/logger';
import { sendOverdueReminders } from './action-mail.service';

/** Looks for overdue corrective actions every few minutes; the lock and the claimed row make it once. */
export function startReminderScheduler(intervalMs = 10 * 60_000): { stop(): void } {
  let running = false;
  const tick = async () => {
    if (running) return;
    running = true;
    try {
      const r = await sendOverdueReminders();
      if (r.reminded || r.failed) logger.info(r, 'overdue action reminders sent');
    } catch (err) {
      logger.error({ err }, 'overdue action reminders failed');
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void tick(), intervalMs);
  timer.unref();
  return { stop: () => clearInterval(timer) };
}
