import 'reflect-metadata';
import { createServer as createHttpServer, type Server } from 'node:http';
import { createServer as createHttpsServer } from 'node:https';
import { createApp } from './app';
import { startAuthMaintenance } from './auth/auth-maintenance';
import { createSessionStore } from './auth/session';
import { config } from './core/config';
import { logger } from './core/logger';
import { installProcessGuards } from './core/process-guards';
import { labCertificate } from './core/tls';
import { dataSource } from './db/data-source';
import { startDigestScheduler } from './mail/digest-scheduler';
import { registerMailListeners } from './mail/mail-listeners';
import { startReminderScheduler } from './mail/reminder-scheduler';
import { closeMailTransport } from './mail/mail-transport';

export interface RunningServer {
  url: string;
  server: Server;
  close(): Promise<void>;
}

const drainMs = 10_000;

/**
 * Stops taking connections and lets requests in flight finish; idle keep-alive connections close at
 * once, and whatever still runs after drainMs is cut so that a stop never hangs.
 */
async function drain(server: Server): Promise<void> {
  const closed = new Promise<void>((resolve) => server.close(() => resolve()));
  server.closeIdleConnections();
  // A connection that finishes its last request goes idle under keep-alive: close it then, not 5 s later.
  const sweep = setInterval(() => server.closeIdleConnections(), 100);
  const cut = setTimeout(() => {
    logger.warn(`requests still running after ${drainMs / 1000} s; closing their connections`);
    server.closeAllConnections();
  }, drainMs);
  cut.unref();
  await closed;
  clearTimeout(cut);
  clearInterval(sweep);
}

/** Config → DataSource → migrations → app → listen; close() undoes it in reverse. */
export async function startServer(
  options: { migrate?: boolean; digest?: boolean; port?: number } = {},
): Promise<RunningServer> {
  const c = config();
  if (!dataSource.isInitialized) await dataSource.initialize();
  if (options.migrate ?? true) await dataSource.runMigrations({ transaction: 'each' });
  const sessionStore = createSessionStore();
  const app = createApp({ sessionStore });
  const stopMailListeners = registerMailListeners();
  const digest = (options.digest ?? c.NODE_ENV !== 'test') ? startDigestScheduler() : undefined;
  const maintenance = startAuthMaintenance();
  void maintenance.run();
  const reminders = (options.digest ?? c.NODE_ENV !== 'test') ? startReminderScheduler() : undefined;
  const port = options.port ?? c.PORT;
  // Both servers are made first and listened on here: Express 5's app.listen hands a busy port to its
  // callback rather than to 'error', and we must refuse to start rather than report a port someone else holds.
  const server: Server = c.HTTPS ? createHttpsServer(labCertificate(c.TLS_DIR, c.HOST), app) : createHttpServer(app);
  const stopWork = () => {
    digest?.stop();
    maintenance.stop();
    reminders?.stop();
    stopMailListeners();
    closeMailTransport();
  };
  try {
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(port, c.HOST, () => {
        server.off('error', reject);
        resolve();
      });
    });
  } catch (err) {
    stopWork();
    await sessionStore.close();
    throw err;
  }
  const address = server.address();
  const url = `${c.HTTPS ? 'https' : 'http'}://${c.HOST}:${typeof address === 'object' && address ? address.port : port}`;
  logger.info(`Asepta is serving ${url}`);
  return {
    url,
    server,
    async close() {
      await drain(server);
      stopWork();
      await sessionStore.close();
      if (dataSource.isInitialized) await dataSource.destroy();
    },
  };
}

const isEntryPoint = process.argv[1]?.endsWith('server/main.ts');
if (isEntryPoint) {
  installProcessGuards();
  // With the guards installed a failed start would otherwise leave a process that serves nothing.
  const running = await startServer().catch((err: unknown) => {
    logger.fatal({ err }, 'Asepta could not start');
    process.exit(1);
  });
  const stop = () => void running.close().then(() => process.exit(0));
  process.once('SIGINT', stop);
  process.once('SIGTERM', stop);
}
