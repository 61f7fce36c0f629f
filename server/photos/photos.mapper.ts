import { photoUrls, type PhotoDto } from '../../shared/schemas/photos';
import type { Photo } from './photo.entity';

export const toPhotoDto = (p: Photo): PhotoDto => ({
  id: p.id,
  sha256: p.sha256,
  mime: p.mime,
  bytes: p.bytes,
  width: p.width,
  height: p.height,
  ...photoUrls(p.id),
});
