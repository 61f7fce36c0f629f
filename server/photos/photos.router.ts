import { Router } from 'express';
import { photoField, photoMaxBytes, photoMaxFiles } from '../../shared/schemas/photos';
import { currentUser, requireUser } from '../core/auth-guards';
import { idParam, requireWriter, validId } from '../core/record-routes';
import { receiveUpload } from '../core/uploads';
import { idempotentHandler } from '../idempotency/idempotent-route';
import { getPhoto, openPhoto, uploadPhotos } from './photos.service';

export const photosRouter = Router();

const receivePhotos = receiveUpload({
  field: photoField,
  maxBytes: photoMaxBytes,
  maxFiles: photoMaxFiles,
  noun: 'photo',
  limits: { fields: 10, parts: photoMaxFiles + 10 },
});

photosRouter.post(
  '/',
  requireWriter,
  receivePhotos,
  idempotentHandler('photos', 201, (req, claim) =>
    uploadPhotos(currentUser(req), Array.isArray(req.files) ? req.files : [], claim),
  ),
);

photosRouter.get('/:id', requireUser, validId, async (req, res) => {
  res.json(await getPhoto(idParam(req)));
});

for (const variant of ['original', 'thumb'] as const) {
  photosRouter.get(`/:id/${variant}`, requireUser, validId, async (req, res) => {
    const file = await openPhoto(idParam(req), variant);
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
