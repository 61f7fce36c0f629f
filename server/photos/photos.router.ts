import { Router } from 'express';
import multer from 'multer';
import { idParamsSchema } from '../../shared/schemas/common';
import { photoField, photoMaxBytes, photoMaxFiles } from '../../shared/schemas/photos';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { receiveUpload } from '../core/uploads';
import { validate } from '../core/validate';
import { idempotentHandler } from '../idempotency/idempotent-route';
import { getPhoto, openPhoto, uploadPhotos } from './photos.service';

export const photosRouter = Router();

const upload = multer({
  storage: multer.memoryStorage(),
  limits: { fileSize: photoMaxBytes, files: photoMaxFiles, fields: 10, parts: photoMaxFiles + 10 },
}).array(photoField, photoMaxFiles);

const limitMessages: Partial<Record<multer.ErrorCode, [number, string]>> = {
  LIMIT_FILE_SIZE: [413, `each photo may be at most ${photoMaxBytes / 1024 / 1024} MB`],
  LIMIT_FILE_COUNT: [413, `send at most ${photoMaxFiles} photos at a time`],
  LIMIT_UNEXPECTED_FILE: [400, `send photos in the multipart field "${photoField}", at most ${photoMaxFiles}`],
};

const receivePhotos = receiveUpload(upload, photoField, limitMessages);

const writers = requireRole('technician', 'supervisor', 'admin');

photosRouter.post(
  '/',
  writers,
  receivePhotos,
  idempotentHandler('photos', 201, (req, claim) =>
    uploadPhotos(currentUser(req), Array.isArray(req.files) ? req.files : [], claim),
  ),
);

photosRouter.get('/:id', requireUser, validate({ params: idParamsSchema }), async (req, res) => {
  res.json(await getPhoto(Number(req.params.id)));
});

for (const variant of ['original', 'thumb'] as const) {
  photosRouter.get(`/:id/${variant}`, requireUser, validate({ params: idParamsSchema }), async (req, res) => {
    const file = await openPhoto(Number(req.params.id), variant);
    const etag = `"${file.sha256}-${file.variant}"`;
    // Content-addressed, so a cached copy never goes stale; private because it needs a sign-in.
    res.setHeader('Cache-Control', 'private, max-age=31536000, immutable');
    res.setHeader('ETag', etag);
    if (req.headers['if-none-match'] === etag) {
      file.stream.destroy();
      return void res.status(304).end();
    }
    res.type(file.mime);
    file.stream.on('error', (err) => res.destroy(err));
    file.stream.pipe(res);
  });
}
