import { z } from 'zod';

export const photoAcceptedTypes = ['image/jpeg', 'image/png', 'image/webp'] as const;
export const photoMaxBytes = 12 * 1024 * 1024;
export const photoMaxFiles = 6;
/** The multipart field every photo upload uses. */
export const photoField = 'photos';

export const heicRefusal =
  "HEIC photos are not accepted: set the phone camera to 'Most Compatible' (JPEG) and take the photo again.";

export const photoSchema = z.object({
  id: z.number().int(),
  sha256: z.string(),
  mime: z.string(),
  bytes: z.number().int(),
  width: z.number().int().nullable(),
  height: z.number().int().nullable(),
  url: z.string(),
  thumbUrl: z.string(),
});
export type PhotoDto = z.infer<typeof photoSchema>;

export const photoUrls = (id: number) => ({ url: `/api/photos/${id}/original`, thumbUrl: `/api/photos/${id}/thumb` });
