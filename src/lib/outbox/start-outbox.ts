import { flushOutbox } from './outbox-sender';
import { keepStorage } from './outbox-store';

const retryMs = 30_000;

/** Sends by itself: at start, when the connection returns, when the app comes back to the front. */
export function startOutbox(): void {
  void keepStorage();
  const flush = () => void flushOutbox().catch(() => undefined);
  flush();
  window.addEventListener('online', flush);
  document.addEventListener('visibilitychange', () => {
    if (document.visibilityState === 'visible') flush();
  });
  // 'online' only means a network is there, not that the server answers: try again now and then.
  window.setInterval(flush, retryMs);
}
