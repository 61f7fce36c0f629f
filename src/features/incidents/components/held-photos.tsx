import { useRef } from 'react';
import { PhotoFileInput } from '../../../components/photos/photo-file-input';
import { usePreviewUrls } from '../../../components/photos/use-preview-urls';
import { Button } from '../../../components/ui/button';
import { uploadEarly } from '../../../lib/outbox/early-uploads';
import { newKey } from '../../../lib/outbox/outbox-items';
import { photoRefusal } from '../../../lib/photo-bytes';

export interface HeldPhoto {
  key: number;
  /** The photo's Idempotency-Key: sent early when there is signal, the flag's own send then gets the stored answer. */
  uploadKey: string;
  file: File;
  preview: string;
  /** Why the photo cannot be sent; the form is blocked until it is removed or replaced. */
  refusal?: string | null;
}

interface Props {
  photos: HeldPhoto[];
  onChange: (update: (photos: HeldPhoto[]) => HeldPhoto[]) => void;
  max?: number;
}

/**
 * Takes or picks photos and keeps them on the phone; they go out with the flag through the outbox,
 * so a photo taken with no signal is not lost. Each is checked from its bytes as it is picked.
 */
export function HeldPhotos({ photos, onChange, max = 6 }: Props) {
  const nextKey = useRef(1);
  const input = useRef<HTMLInputElement>(null);
  const replacing = useRef<number | null>(null);
  const previews = usePreviewUrls();

  const add = (files: File[]) => {
    const replace = replacing.current;
    replacing.current = null;
    const room = replace === null ? Math.max(0, max - photos.length) : 1;
    const picked = files.slice(0, room).map((file) => ({
      key: nextKey.current++,
      uploadKey: newKey(),
      file,
      preview: previews.make(file),
      refusal: undefined,
    }));
    onChange((all) => {
      const kept = replace === null ? all : all.filter((p) => p.key !== replace);
      return [...kept, ...picked];
    });
    for (const p of picked) {
      void photoRefusal(p.file).then((refusal) => {
        onChange((all) => all.map((x) => (x.key === p.key ? { ...x, refusal } : x)));
        if (!refusal) uploadEarly(p.uploadKey, p.file);
      });
    }
  };

  const remove = (photo: HeldPhoto) => {
    previews.release(photo.preview);
    onChange((all) => all.filter((p) => p.key !== photo.key));
  };

  return (
    <div className="flex flex-col gap-2">
      <PhotoFileInput
        label={photos.length ? 'Add another photo' : 'Take a photo'}
        full={photos.length >= max}
        className="min-h-14"
        inputRef={input}
        onPick={add}
      />
      {photos.length > 0 && (
        <ul className="grid grid-cols-3 gap-2" aria-label="Photos">
          {photos.map((p) => (
            <li key={p.key} className="flex flex-col gap-1 rounded-md border border-line bg-surface-raised p-1.5">
              <img src={p.preview} alt={p.file.name} className="aspect-square w-full rounded object-cover" />
              {p.refusal && (
                <p role="alert" className="text-xs font-medium text-danger">
                  {p.refusal}
                </p>
              )}
              <div className="flex gap-1">
                {p.refusal && (
                  <Button
                    variant="ghost"
                    className="min-h-0 flex-1 px-1 py-1 text-xs"
                    onClick={() => {
                      replacing.current = p.key;
                      input.current?.click();
                    }}
                  >
                    Replace
                  </Button>
                )}
                <Button variant="ghost" className="min-h-0 flex-1 px-1 py-1 text-xs" onClick={() => remove(p)}>
                  Remove
                </Button>
              </div>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
