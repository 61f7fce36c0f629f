import { useEffect, useRef } from 'react';
import { photoAcceptedTypes } from '../../../../shared/schemas/photos';
import { Button } from '../../../components/ui/button';
import { Icon } from '../../../components/ui/icon';
import { cx } from '../../../lib/cx';
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

  const latest = useRef(photos);
  useEffect(() => {
    latest.current = photos;
  });
  useEffect(() => () => latest.current.forEach((p) => URL.revokeObjectURL(p.preview)), []);

  const add = (files: FileList | null) => {
    const replace = replacing.current;
    replacing.current = null;
    const room = replace === null ? Math.max(0, max - photos.length) : 1;
    const picked = Array.from(files ?? [])
      .slice(0, room)
      .map((file) => ({
        key: nextKey.current++,
        uploadKey: newKey(),
        file,
        preview: URL.createObjectURL(file),
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
    if (input.current) input.current.value = '';
  };

  const remove = (photo: HeldPhoto) => {
    URL.revokeObjectURL(photo.preview);
    onChange((all) => all.filter((p) => p.key !== photo.key));
  };

  return (
    <div className="flex flex-col gap-2">
      <label
        className={cx(
          'flex min-h-14 cursor-pointer items-center justify-center gap-2 rounded-md border-2 border-dashed border-line-strong px-4 font-semibold text-accent',
          photos.length >= max && 'pointer-events-none opacity-60',
        )}
      >
        <Icon name="plus" size={22} />
        {photos.length ? 'Add another photo' : 'Take a photo'}
        <input
          ref={input}
          type="file"
          accept={photoAcceptedTypes.join(',')}
          capture="environment"
          multiple
          className="sr-only"
          disabled={photos.length >= max}
          onChange={(e) => add(e.target.files)}
        />
      </label>
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
