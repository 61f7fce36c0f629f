import type { ShelfMark } from '../../../shared/schemas/jar-shelf';
import { newKey } from '../../lib/outbox/outbox-items';
import { flushOutbox, isInFlight } from '../../lib/outbox/outbox-sender';
import { getItem, putItem, removeItem } from '../../lib/outbox/outbox-store';
import type { WalkMark } from './walk-state';

/** Saved as made: the mark is on the phone at once and on the server as soon as there is signal. */
export async function queueMark(jar: { id: number; label: string }, mark: ShelfMark): Promise<WalkMark> {
  const key = newKey();
  await putItem({
    id: key,
    kind: 'mark',
    createdAt: Date.now(),
    state: 'waiting',
    jarId: jar.id,
    label: jar.label,
    mark,
  });
  void flushOutbox().catch(() => undefined);
  return { jarId: jar.id, label: jar.label, mark, key };
}

/** A mark still on the phone is simply dropped; one that reached the server is undone there. */
export async function undoMark(mark: WalkMark): Promise<void> {
  const queued = await getItem(mark.key);
  if (queued && queued.state === 'waiting' && !isInFlight(mark.key)) {
    await removeItem(mark.key);
    return;
  }
  if (queued?.state === 'refused') {
    await removeItem(mark.key);
    return;
  }
  await putItem({
    id: newKey(),
    kind: 'unmark',
    createdAt: Date.now(),
    state: 'waiting',
    markId: mark.key,
    label: mark.label,
  });
  void flushOutbox().catch(() => undefined);
}
