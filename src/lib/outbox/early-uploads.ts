import { idempotencyHeader } from '../../../shared/schemas/idempotency';
import { photoField } from '../../../shared/schemas/photos';
import { upload } from '../upload';

/** Photos sent while the form is still being filled in, by Idempotency-Key; the outbox waits on them. */
const pending = new Map<string, Promise<number | undefined>>();

/**
 * With signal, a photo starts uploading as soon as it is taken. A failure is silent: the flag's
 * outbox sends the photo again under the same key, with or without signal.
 */
export function uploadEarly(key: string, file: File): void {
  if (!navigator.onLine || pending.has(key)) return;
  const body = new FormData();
  body.append(photoField, file, file.name);
  const sent = upload<{ id: number }[]>('/photos', body, { headers: { [idempotencyHeader]: key } }).then(
    ([photo]) => photo?.id,
    () => undefined,
  );
  pending.set(key, sent);
  void sent.finally(() => window.setTimeout(() => pending.delete(key), 60_000));
}

/** The id of a photo already stored by an early upload, waiting for one still on its way. */
export const earlyUpload = (key: string): Promise<number | undefined> => pending.get(key) ?? Promise.resolve(undefined);
