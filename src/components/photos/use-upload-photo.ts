import { useMutation } from '@tanstack/react-query';
import { photoField, photoSchema, type PhotoDto } from '../../../shared/schemas/photos';
import { upload } from '../../lib/upload';

interface UploadOne {
  file: File;
  onProgress: (fraction: number) => void;
  signal?: AbortSignal;
}

/** One photo per request, so each file shows its own progress and one refusal does not sink the rest. */
export function useUploadPhoto() {
  return useMutation({
    mutationFn: async ({ file, onProgress, signal }: UploadOne): Promise<PhotoDto> => {
      const body = new FormData();
      body.append(photoField, file, file.name);
      const [photo] = await upload<unknown[]>('/photos', body, { onProgress, signal });
      return photoSchema.parse(photo);
    },
  });
}
