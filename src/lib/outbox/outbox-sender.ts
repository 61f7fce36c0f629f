import { idempotencyHeader } from '../../../shared/schemas/idempotency';
import { photoField } from '../../../shared/schemas/photos';
import { api, ApiError } from '../api-client';
import { upload } from '../upload';
import { earlyUpload } from './early-uploads';
import type { OutboxItem, OutboxPhoto } from './outbox-items';
import { listItems, putItem, removeItem } from './outbox-store';
import { setProgress } from './outbox-progress';

/** What a delivered item made, for the screen that is waiting on it (the flag form). */
export interface Delivered {
  incidentId?: number;
}
const delivered = new Map<string, Delivered>();

const keyed = (key: string) => ({ headers: { [idempotencyHeader]: key } });

/** Worth sending again later: no connection, a server in trouble, signed out, or a repeat still in flight. */
function isPassing(error: unknown): boolean {
  if (!(error instanceof ApiError)) return true;
  return (
    error.status === 0 ||
    error.status >= 500 ||
    error.status === 401 ||
    error.status === 408 ||
    error.status === 429 ||
    error.code === 'request-in-progress' ||
    error.code === 'csrf-invalid'
  );
}

/** Uploads the photos not yet stored, remembering each id so a retry does not send it again. */
async function sendPhotos(item: OutboxItem & { photos: OutboxPhoto[] }): Promise<number[]> {
  const total = item.photos.length;
  for (const [i, photo] of item.photos.entries()) {
    if (photo.photoId) continue;
    const early = await earlyUpload(photo.key);
    if (early) {
      photo.photoId = early;
      await putItem(item);
      continue;
    }
    const body = new FormData();
    body.append(photoField, photo.blob, photo.name);
    const [stored] = await upload<{ id: number }[]>('/photos', body, {
      ...keyed(photo.key),
      onProgress: (f) => setProgress(item.id, (i + f) / total),
    });
    if (!stored) throw new Error('the server answered an upload with no photo');
    photo.photoId = stored.id;
    await putItem(item);
  }
  return item.photos.map((p) => p.photoId!);
}

async function deliver(item: OutboxItem): Promise<Delivered> {
  switch (item.kind) {
    case 'flag': {
      const photoIds = await sendPhotos(item);
      const incident = await api.post<{ id: number }>('/incidents', { ...item.input, photoIds }, keyed(item.id));
      return { incidentId: incident.id };
    }
    case 'photos': {
      const photoIds = await sendPhotos(item);
      await api.post(`/incidents/${item.incidentId}/photos`, { photoIds }, keyed(item.id));
      return { incidentId: item.incidentId };
    }
    case 'mark':
      await api.post('/jars/shelf-walk', { marks: [{ jarId: item.jarId, mark: item.mark }] }, keyed(item.id));
      return {};
    case 'unmark':
      try {
        await api.post('/jars/shelf-walk/undo', { key: item.markId }, keyed(item.id));
      } catch (error) {
        // Already undone, or the mark never reached the server: either way nothing is left to undo.
        if (!(error instanceof ApiError) || (error.status !== 410 && error.status !== 404)) throw error;
      }
      return {};
  }
}

/** 'stop' ends this round: the rest of the queue waits for the connection instead of failing in turn. */
const inFlight = new Set<string>();

/** True while this tab is sending the item: it can no longer be taken back silently. */
export const isInFlight = (id: string) => inFlight.has(id);

async function sendOne(item: OutboxItem): Promise<'sent' | 'refused' | 'stop'> {
  inFlight.add(item.id);
  try {
    const result = await deliver(item);
    delivered.set(item.id, result);
    await removeItem(item.id);
    return 'sent';
  } catch (error) {
    if (isPassing(error)) return 'stop';
    const api = error as ApiError;
    await putItem({ ...item, state: 'refused', reason: api.message, reasonField: api.issues[0]?.path });
    return 'refused';
  } finally {
    inFlight.delete(item.id);
    setProgress(item.id, undefined);
  }
}

let running: Promise<void> | undefined;
let again = false;

async function round(): Promise<void> {
  do {
    again = false;
    for (const item of await listItems()) {
      if (item.state !== 'waiting') continue;
      if ((await sendOne(item)) === 'stop') return;
    }
  } while (again);
}

/** Sends every waiting item in the order made; one round at a time per tab. */
export function flushOutbox(): Promise<void> {
  if (running) {
    again = true;
    return running;
  }
  running = round().finally(() => {
    running = undefined;
  });
  return running;
}

/** Sends now and tells whether this item got through (and what it made), or still waits. */
export async function sendAndWait(id: string): Promise<Delivered | undefined> {
  await flushOutbox();
  if (!delivered.has(id)) await flushOutbox();
  return delivered.get(id);
}
