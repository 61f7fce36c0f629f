import { config } from '../core/config';
import { logger } from '../core/logger';
import { pruneLoginFailures } from './login-limit.service';
import { deleteExpiredSessions } from './session-records';

export interface AuthMaintenance {
  /** One sweep now; never rejects. */
  run(): Promise<void>;
  stop(): void;
}

/**
 * Removes expired sessions and old sign-in failures. Each sweep catches and logs its errors: the
 * session store's own sweep rejected unhandled while MariaDB was away and took the process down.
 */
export function startAuthMaintenance(intervalMs = config().MAINTENANCE_INTERVAL_SECONDS * 1000): AuthMaintenance {
  let running = false;
  const run = async () => {
    if (running) return;
    running = true;
    try {
      const sessions = await deleteExpiredSessions();
      await pruneLoginFailures();
      logger.debug({ sessions }, 'auth maintenance swept');
    } catch (err) {
      logger.warn({ err }, 'auth maintenance failed; the next sweep tries again');
    } finally {
      running = false;
    }
  };
  const timer = setInterval(() => void run(), intervalMs);
  timer.unref();
  return { run, stop: () => clearInterval(timer) };
}
