import type { CreateIncidentInput } from '../../../shared/schemas/incidents';
import { ApiError } from '../../lib/api-client';
import { newKey, type OutboxPhoto } from '../../lib/outbox/outbox-items';
import { sendAndWait } from '../../lib/outbox/outbox-sender';
import { getItem, putItem, removeItem } from '../../lib/outbox/outbox-store';

export type Outcome = { sent: true; incidentId: number } | { sent: false };

/** Each photo keeps the key it may already have been sent under, so it is stored once. */
export interface PhotoToSend {
  uploadKey: string;
  file: File;
}
const held = (photos: PhotoToSend[]): OutboxPhoto[] =>
  photos.map((p) => ({ key: p.uploadKey, name: p.file.name, blob: p.file }));

/**
 * Puts the flag (or the photos for an open incident) in the outbox first, then tries to send it:
 * with signal it goes at once; without, it waits on the phone. A refusal while the technician is
 * still on the form comes back as an ApiError, and the item leaves the queue: the form shows it.
 */
async function queueAndSend(item: Parameters<typeof putItem>[0]): Promise<Outcome> {
  await putItem(item);
  const delivered = await sendAndWait(item.id);
  if (delivered?.incidentId) return { sent: true, incidentId: delivered.incidentId };
  const after = await getItem(item.id);
  if (after?.state === 'refused') {
    await removeItem(item.id);
    const issues = after.reasonField ? [{ path: after.reasonField, message: after.reason ?? 'refused' }] : [];
    throw new ApiError(422, 'refused', after.reason ?? 'The server refused the flag.', issues);
  }
  return { sent: false };
}

export const sendFlag = (input: Omit<CreateIncidentInput, 'photoIds'>, files: PhotoToSend[]) =>
  queueAndSend({ id: newKey(), kind: 'flag', createdAt: Date.now(), state: 'waiting', input, photos: held(files) });

export const sendPhotosTo = (incidentId: number, files: PhotoToSend[]) =>
  queueAndSend({
    id: newKey(),
    kind: 'photos',
    createdAt: Date.now(),
    state: 'waiting',
    incidentId,
    photos: held(files),
  });
