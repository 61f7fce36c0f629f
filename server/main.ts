import 'reflect-metadata';
import type { Server } from 'node:http';
import { createApp } from './app';
import { createSessionStore } from './auth/session';
import { config } from './core/config';
import { logger } from './core/logger';
import { dataSource } from './db/data-source';
import { startDigestScheduler } from './mail/digest-scheduler';
import { registerMailListeners } from './mail/mail-listeners';
import { startReminderScheduler } from './mail/reminder-scheduler';
import { closeMailTransport } from './mail/mail-transport';

export interface RunningServer {
  url: string;
  close(): Promise<void>;
}

/** Config → DataSource → migrations → app → listen; close() undoes it in reverse. */
export async function startServer(options: { migrate?: boolean; digest?: boolean } = {}): Promise<RunningServer> {
  const c = config();
  if (!dataSource.isInitialized) await dataSource.initialize();
  if (options.migrate ?? true) await dataSource.runMigrations({ transaction: 'each' });
  const sessionStore = createSessionStore();
  const app = createApp({ sessionStore });
  const stopMailListeners = registerMailListeners();
  const digest = (options.digest ?? c.NODE_ENV !== 'test') ? startDigestScheduler() : undefined;
  const reminders = (options.digest ?? c.NODE_ENV !== 'test') ? startReminderScheduler() : undefined;
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(c.PORT, c.HOST, () => resolve(s)).once('error', reject);
  });
  const address = server.address();
  const port = typeof address === 'object' && address ? address.port : c.PORT;
  const url = `http://${c.HOST}:${port}`;
  logger.info(`Asepta is serving ${url}`);
  return {
    url,
    async close() {
      const closed = new Promise<void>((resolve) => server.close(() => resolve()));
      server.closeAllConnections();
      await closed;
      digest?.stop();
      reminders?.stop();
      stopMailListeners();
      closeMailTransport();
      await sessionStore.close();
      if (dataSource.isInitialized) await dataSource.destroy();
    },
  };
}

const isEntryPoint = process.argv[1]?.endsWith('server/main.ts');
if (isEntryPoint) {
  const running = await startServer();
  const stop = () => void running.close().then(() => process.exit(0));
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}
