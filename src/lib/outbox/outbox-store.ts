import { openDB, type DBSchema, type IDBPDatabase } from 'idb';
import type { OutboxItem } from './outbox-items';

interface OutboxDb extends DBSchema {
  items: { key: string; value: OutboxItem; indexes: { createdAt: number } };
}

let dbPromise: Promise<IDBPDatabase<OutboxDb>> | undefined;
const db = () =>
  (dbPromise ??= openDB<OutboxDb>('asepta-outbox', 1, {
    upgrade(d) {
      d.createObjectStore('items', { keyPath: 'id' }).createIndex('createdAt', 'createdAt');
    },
  }));

// Other tabs of the app hear about changes too, so every open screen shows the same queue.
const channel = typeof BroadcastChannel === 'undefined' ? undefined : new BroadcastChannel('asepta-outbox');
const listeners = new Set<() => void>();
const notifyHere = () => listeners.forEach((l) => l());
channel?.addEventListener('message', notifyHere);
function changed() {
  notifyHere();
  channel?.postMessage('changed');
}

export function onOutboxChange(listener: () => void): () => void {
  listeners.add(listener);
  return () => listeners.delete(listener);
}

/** In the order made: a mark's undo must follow the mark, a flag its jar's marks. */
export const listItems = async (): Promise<OutboxItem[]> => (await db()).getAllFromIndex('items', 'createdAt');

export const getItem = async (id: string) => (await db()).get('items', id);

export async function putItem(item: OutboxItem): Promise<void> {
  await (await db()).put('items', item);
  changed();
}

export async function removeItem(id: string): Promise<void> {
  await (await db()).delete('items', id);
  changed();
}

/** Asks the browser not to evict the queue under storage pressure; a refusal is not an error. */
export async function keepStorage(): Promise<void> {
  try {
    await navigator.storage?.persist?.();
  } catch {
    // best effort only
  }
}
