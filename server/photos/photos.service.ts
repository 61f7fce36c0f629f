import type { Readable } from 'node:stream';
import { QueryFailedError, type EntityManager } from 'typeorm';
import { photoAcceptedTypes, photoField, type PhotoDto } from '../../shared/schemas/photos';
import { recordAudit, type Actor } from '../audit/audit.service';
import { AppError, badRequest, notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { claimKey, isKeyClash, type IdempotencyClaim } from '../idempotency/idempotency.service';
import { checkPixels, checkType, unreadable, type Checked, type UploadedFile } from './photo-checks';
import type { Photo } from './photo.entity';
import { toPhotoDto } from './photos.mapper';
import { photosRepository } from './photos.repository';
import { photoStorage } from './photo-storage';
import { thumbnailer, type DecodedPhoto } from './thumbnailer';

export type { UploadedFile } from './photo-checks';

const extensions: Record<(typeof photoAcceptedTypes)[number], string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
};
const storageKeys = (sha256: string, mime: Checked['mime']) => ({
  storageKey: `originals/${sha256.slice(0, 2)}/${sha256}.${extensions[mime]}`,
  thumbKey: `thumbs/${sha256.slice(0, 2)}/${sha256}.jpg`,
});

const isDuplicate = (err: unknown) =>
  err instanceof QueryFailedError && (err.driverError as { code?: string }).code === 'ER_DUP_ENTRY';

async function decode(c: Checked, index: number): Promise<DecodedPhoto> {
  try {
    return await thumbnailer.decode(c.file.buffer, c.mime);
  } catch {
    throw unreadable(c, index);
  }
}

/**
 * Stores each photo once by its SHA-256. Every file is checked before any is stored, so a
 * refused file leaves nothing behind; files written for a failed transaction are removed again.
 */
export async function uploadPhotos(
  actor: Actor & { id: number },
  files: UploadedFile[],
  claim?: IdempotencyClaim,
): Promise<PhotoDto[]> {
  if (files.length === 0)
    throw badRequest(`${photoField}: attach at least one photo`, [
      { path: photoField, message: 'attach at least one photo' },
    ]);
  const checked = await Promise.all(files.map(checkType));
  checked.forEach(checkPixels);
  const known = new Map((await photosRepository.findBySha(checked.map((c) => c.sha256))).map((p) => [p.sha256, p]));
  const fresh = new Map<string, { c: Checked; index: number }>();
  checked.forEach((c, index) => {
    if (!known.has(c.sha256) && !fresh.has(c.sha256)) fresh.set(c.sha256, { c, index });
  });
  const decoded = await Promise.all(
    [...fresh.values()].map(async ({ c, index }) => ({ c, d: await decode(c, index) })),
  );

  const written: string[] = [];
  const storage = photoStorage();
  try {
    for (const { c, d } of decoded) {
      const keys = storageKeys(c.sha256, c.mime);
      for (const [key, bytes] of [
        [keys.storageKey, c.file.buffer],
        [keys.thumbKey, d.thumb],
      ] as const) {
        if (await storage.exists(key)) continue;
        await storage.put(key, bytes);
        written.push(key);
      }
    }
    await dataSource.transaction(async (m) => {
      await claimKey(m, claim);
      for (const { c, d } of decoded) {
        const photo = await photosRepository.insert(m, {
          sha256: c.sha256,
          mime: c.mime,
          bytes: c.file.buffer.length,
          width: d.width,
          height: d.height,
          uploadedById: actor.id,
          ...storageKeys(c.sha256, c.mime),
        });
        known.set(photo.sha256, photo);
        await recordAudit(m, actor, [
          {
            action: 'upload',
            recordType: 'photo',
            recordId: photo.id,
            newValue: { sha256: photo.sha256, mime: photo.mime, bytes: photo.bytes },
          },
        ]);
      }
    });
  } catch (err) {
    // A concurrent upload of the same photo may own a file we also wrote: remove only unreferenced ones.
    const stored = await photosRepository.findBySha(checked.map((c) => c.sha256));
    const referenced = new Set(stored.flatMap((p) => [p.storageKey, p.thumbKey]));
    for (const key of written) if (!referenced.has(key)) await storage.remove(key);
    // Someone stored the same photo a moment ago: theirs is the one copy.
    if (!isDuplicate(err) || isKeyClash(err)) throw err;
    for (const p of stored) known.set(p.sha256, p);
  }
  return checked.map((c) => {
    const photo = known.get(c.sha256);
    if (!photo) throw new Error(`photo ${c.sha256} was neither found nor stored`);
    return toPhotoDto(photo);
  });
}

export async function getPhoto(id: number): Promise<PhotoDto> {
  const photo = await photosRepository.findById(id);
  if (!photo) throw notFound('Photo');
  return toPhotoDto(photo);
}

export interface PhotoFile {
  stream: Readable;
  mime: string;
  sha256: string;
  variant: 'original' | 'thumb';
}

/** The thumbnail falls back to the original while it is missing (still being made, or failed). */
export async function openPhoto(id: number, variant: 'original' | 'thumb'): Promise<PhotoFile> {
  const photo = await photosRepository.findById(id);
  if (!photo) throw notFound('Photo');
  const storage = photoStorage();
  if (variant === 'thumb' && photo.thumbKey && (await storage.exists(photo.thumbKey))) {
    return { stream: await storage.open(photo.thumbKey), mime: 'image/jpeg', sha256: photo.sha256, variant };
  }
  return { stream: await storage.open(photo.storageKey), mime: photo.mime, sha256: photo.sha256, variant: 'original' };
}

/** For other modules that attach one photo and word their own refusal. */
export const photoExists = (m: EntityManager, id: number) => photosRepository.exists(m, id);

/** For other modules that attach photos: every id must exist, else a 422 naming the field. */
export async function requirePhotos(manager: EntityManager, ids: number[], field: string): Promise<Photo[]> {
  const unique = [...new Set(ids)];
  const found = await photosRepository.findByIds(unique, manager);
  const missing = unique.filter((id) => !found.some((p) => p.id === id));
  if (missing.length) {
    throw new AppError(422, 'unprocessable', `${field}: no photo with id ${missing.join(', ')}`, [
      { path: field, message: `no photo with id ${missing.join(', ')}` },
    ]);
  }
  return found;
}
