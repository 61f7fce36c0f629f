import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from './errors';

interface UploadRules {
  /** The multipart field the file(s) travel in. */
  field: string;
  maxBytes: number;
  /** Set for a field of several files; without it the field takes one file. */
  maxFiles?: number;
  /** What the files are, for the messages: "photo", "file". */
  noun?: string;
  /** Multer's other limits (fields, parts), for a route that takes text fields too. */
  limits?: Omit<multer.Options['limits'] & object, 'fileSize' | 'files'>;
}

type LimitMessages = Partial<Record<multer.ErrorCode, [status: number, message: string]>>;

const megabytes = (bytes: number) => `${Math.round((bytes / 1024 / 1024) * 10) / 10} MB`;

/** Every limit an upload route sets, worded from that limit: multer's own messages say neither field nor limit. */
function limitMessages({ field, maxBytes, maxFiles = 1, noun = 'file' }: UploadRules): LimitMessages {
  return {
    LIMIT_FILE_SIZE: [413, `each ${noun} may be at most ${megabytes(maxBytes)}`],
    LIMIT_FILE_COUNT: [413, `send at most ${maxFiles} ${noun}${maxFiles === 1 ? '' : 's'} at a time`],
    LIMIT_UNEXPECTED_FILE: [
      400,
      maxFiles === 1
        ? `send the ${noun} in the multipart field "${field}"`
        : `send ${noun}s in the multipart field "${field}", at most ${maxFiles}`,
    ],
  };
}

/**
 * Receives a multipart upload into memory so that every way it can fail names its field: multer's limit
 * errors are worded from the route's rules, and a body that cannot be read as multipart at all (no
 * boundary, cut off, bad part headers) comes from busboy as a plain Error, which would otherwise reach
 * the error handler as a 500.
 */
export function receiveUpload(rules: UploadRules): RequestHandler {
  const receiver = multer({
    storage: multer.memoryStorage(),
    limits: { ...rules.limits, fileSize: rules.maxBytes, files: rules.maxFiles ?? 1 },
  });
  const upload =
    rules.maxFiles === undefined ? receiver.single(rules.field) : receiver.array(rules.field, rules.maxFiles);
  const worded = limitMessages(rules);
  return (req, res, next) => {
    void upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        const named = worded[err.code];
        if (!named) return next(err); // the error handler's general mapping
        const [status, message] = named;
        return next(
          new AppError(status, 'upload-rejected', `${rules.field}: ${message}`, [{ path: rules.field, message }]),
        );
      }
      if (err instanceof AppError) return next(err);
      const message = 'could not be read as multipart/form-data (missing boundary or a cut-off body)';
      next(new AppError(400, 'malformed-upload', `${rules.field}: ${message}`, [{ path: rules.field, message }]));
    });
  };
}

/** The bytes of an upload: the multipart file, or else a raw body read by express.raw/express.text. */
export function uploadedBytes(req: Request): Buffer | undefined {
  if (req.file) return req.file.buffer;
  if (Buffer.isBuffer(req.body)) return req.body;
  if (typeof req.body === 'string') return Buffer.from(req.body, 'utf8');
  return undefined;
}
