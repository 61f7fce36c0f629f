import { createHash } from 'node:crypto';
import type { Readable } from 'node:stream';
import { fileTypeFromBuffer } from 'file-type';
import { QueryFailedError, type EntityManager } from 'typeorm';
import { heicRefusal, photoAcceptedTypes, photoField, type PhotoDto } from '../../shared/schemas/photos';
import { recordAudit, type Actor } from '../audit/audit.service';
import { AppError, badRequest, notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { claimKey, isKeyClash, type IdempotencyClaim } from '../idempotency/idempotency.service';
import { Photo } from './photo.entity';
import { toPhotoDto } from './photos.mapper';
import { photosRepository } from './photos.repository';
import { photoStorage } from './photo-storage';
import { thumbnailer, type DecodedPhoto } from './thumbnailer';

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

const extensions: Record<(typeof photoAcceptedTypes)[number], string> = {
  'image/jpeg': 'jpg',
  'image/png': 'png',
  'image/webp': 'webp',
};
const heicTypes = new Set(['image/heic', 'image/heif', 'image/heic-sequence', 'image/heif-sequence']);

const unsupported = (message: string, index: number) =>
  new AppError(415, 'unsupported-media-type', message, [{ path: `${photoField}.${index}`, message }]);

interface Checked {
  file: UploadedFile;
  mime: (typeof photoAcceptedTypes)[number];
  sha256: string;
}

/** The type comes from the bytes, never from the name or the browser's Content-Type. */
async function checkType(file: UploadedFile, index: number): Promise<Checked> {
  const detected = await fileTypeFromBuffer(file.buffer);
  if (detected && heicTypes.has(detected.mime)) throw unsupported(heicRefusal, index);
  const mime = photoAcceptedTypes.find((t) => t === detected?.mime);
  if (!mime) {
    throw unsupported(
      `${photoField}: "${file.originalname}" is not a JPEG, PNG or WebP image (found ${detected?.mime ?? 'no image'}).`,
      index,
    );
  }
  return { file, mime, sha256: createHash('sha256').update(file.buffer).digest('hex') };
}

const storageKeys = (sha256: string, mime: Checked['mime']) => ({
  storageKey: `originals/${sha256.slice(0, 2)}/${sha256}.${extensions[mime]}`,
  thumbKey: `thumbs/${sha256.slice(0, 2)}/${sha256}.jpg`,
});

const isDuplicate = (err: unknown) =>
  err instanceof QueryFailedError && (err.driverError as { code?: string }).code === 'ER_DUP_ENTRY';

async function decode(c: Checked, index: number): Promise<DecodedPhoto> {
  try {
    return await thumbnailer.decode(c.file.buffer);
  } catch {
    throw new AppError(
      422,
      'unreadable-image',
      `${photoField}: "${c.file.originalname}" could not be read as an image; it may be damaged.`,
      [{ path: `${photoField}.${index}`, message: 'could not be read as an image' }],
    );
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
        const photo = await m.save(
          m.create(Photo, {
            sha256: c.sha256,
            mime: c.mime,
            bytes: c.file.buffer.length,
            width: d.width,
            height: d.height,
            uploadedById: actor.id,
            ...storageKeys(c.sha256, c.mime),
          }),
        );
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
