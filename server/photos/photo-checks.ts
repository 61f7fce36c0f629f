import { createHash } from 'node:crypto';
import { fileTypeFromBuffer } from 'file-type';
import { heicRefusal, photoAcceptedTypes, photoField } from '../../shared/schemas/photos';
import { config } from '../core/config';
import { AppError } from '../core/errors';
import { headerPixelSize } from './image-header';

export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

const heicTypes = new Set(['image/heic', 'image/heif', 'image/heic-sequence', 'image/heif-sequence']);

const unsupported = (message: string, index: number) =>
  new AppError(415, 'unsupported-media-type', message, [{ path: `${photoField}.${index}`, message }]);

export interface Checked {
  file: UploadedFile;
  mime: (typeof photoAcceptedTypes)[number];
  sha256: string;
}

/** The type comes from the bytes, never from the name or the browser's Content-Type. */
export async function checkType(file: UploadedFile, index: number): Promise<Checked> {
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

export const unreadable = (c: Checked, index: number) =>
  new AppError(
    422,
    'unreadable-image',
    `${photoField}: "${c.file.originalname}" could not be read as an image; it may be damaged.`,
    [{ path: `${photoField}.${index}`, message: 'could not be read as an image' }],
  );

/**
 * The pixel count comes from the header, before any decoding: a few bytes can claim 50000 × 50000
 * pixels, which would take gigabytes to decode.
 */
export function checkPixels(c: Checked, index: number): void {
  const size = headerPixelSize(c.file.buffer);
  if (!size) throw unreadable(c, index);
  const limit = config().PHOTO_MAX_MEGAPIXELS;
  const megapixels = (size.width * size.height) / 1e6;
  if (megapixels > limit) {
    const message = `may have at most ${limit} megapixels`;
    throw new AppError(
      422,
      'too-many-pixels',
      `${photoField}: "${c.file.originalname}" is ${size.width} × ${size.height} pixels (${megapixels.toFixed(1)} megapixels); a photo ${message}.`,
      [{ path: `${photoField}.${index}`, message }],
    );
  }
}
