import { logger } from './logger';

let installed = false;

/**
 * Last line of defence for entry points: a rejection nobody awaited (a library's timer, say) is
 * logged and the server keeps serving, instead of Node's default of exiting the process.
 */
export function installProcessGuards(): void {
  if (installed) return;
  installed = true;
  process.on('unhandledRejection', (reason) => {
    logger.error({ err: reason }, 'unhandled promise rejection; still serving');
  });
  process.on('uncaughtException', (err, origin) => {
    logger.error({ err, origin }, 'uncaught exception; still serving');
  });
}
