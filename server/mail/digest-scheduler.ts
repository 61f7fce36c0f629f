import { logger } from '../core/logger';
import { digestAlreadySent, isDigestTime, sendWeeklyDigest } from './digest.service';

export interface DigestScheduler {
  tick(now?: Date): Promise<void>;
  stop(): void;
}

/** Checks every few minutes; the lock and the digest_runs row make many instances send once. */
export function startDigestScheduler(intervalMs = 5 * 60_000): DigestScheduler {
  let running = false;
  const tick = async (now = new Date()) => {
    if (running || !isDigestTime(now)) return;
    running = true;
    try {
      if (await digestAlreadySent(now)) return;
      const result = await sendWeeklyDigest({ now, trigger: 'schedule' });
      if (!result.skipped) logger.info(result, 'weekly digest sent');
    } catch (err) {
      logger.error({ err }, 'weekly digest failed');
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void tick(), intervalMs);
  timer.unref();
  // A restart on Monday morning should not wait a whole interval before catching up.
  const first = setTimeout(() => void tick(), 30_000);
  first.unref();
  return {
    tick,
    stop: () => {
      clearInterval(timer);
      clearTimeout(first);
    },
  };
}
