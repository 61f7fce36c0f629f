import type { RequestHandler } from 'express';
import multer from 'multer';
import { AppError } from './errors';

type LimitMessages = Partial<Record<multer.ErrorCode, [status: number, message: string]>>;

/**
 * Runs a multer middleware so that every way an upload can fail names its field: `limits` words multer's
 * limit errors for this route (multer's own say neither field nor limit), and a body that cannot be read as
 * multipart at all (no boundary, cut off, bad part headers) comes from busboy as a plain Error, which
 * would otherwise reach the error handler as a 500.
 */
export function receiveUpload(upload: RequestHandler, field: string, limits: LimitMessages = {}): RequestHandler {
  return (req, res, next) => {
    upload(req, res, (err: unknown) => {
      if (!err) return next();
      if (err instanceof multer.MulterError) {
        const named = limits[err.code];
        if (!named) return next(err); // the error handler's general mapping
        const [status, message] = named;
        return next(new AppError(status, 'upload-rejected', `${field}: ${message}`, [{ path: field, message }]));
      }
      if (err instanceof AppError) return next(err);
      const message = 'could not be read as multipart/form-data (missing boundary or a cut-off body)';
      next(new AppError(400, 'malformed-upload', `${field}: ${message}`, [{ path: field, message }]));
    });
  };
}
