import { useEffect, useRef, useState } from 'react';
import { photoMaxBytes, type PhotoDto } from '../../../shared/schemas/photos';
import { Button } from '../ui/button';
import { errorMessage } from '../../lib/api-client';
import { PhotoFileInput } from './photo-file-input';
import { usePreviewUrls } from './use-preview-urls';
import { useUploadPhoto } from './use-upload-photo';

interface Item {
  key: number;
  file: File;
  preview: string;
  progress: number;
  photo?: PhotoDto;
  error?: string;
  abort: AbortController;
}

interface PhotoPickerProps {
  /** The ids of the photos that finished uploading, in the order picked. */
  onChange: (photoIds: number[]) => void;
  /** True while any photo is still on its way. */
  onBusyChange?: (busy: boolean) => void;
  label?: string;
  max?: number;
}

const megabytes = photoMaxBytes / 1024 / 1024;

/** Takes or picks photos and uploads each at once, so they are stored by the time the form is sent. */
export function PhotoPicker({ onChange, onBusyChange, label = 'Take or add photos', max = 6 }: PhotoPickerProps) {
  const [items, setItems] = useState<Item[]>([]);
  const nextKey = useRef(1);
  const previews = usePreviewUrls();
  const uploadPhoto = useUploadPhoto();

  const update = (key: number, patch: Partial<Item>) =>
    setItems((all) => all.map((i) => (i.key === key ? { ...i, ...patch } : i)));

  // The latest callbacks, so a parent passing inline functions does not re-run the report.
  const report = useRef({ onChange, onBusyChange });
  useEffect(() => {
    report.current = { onChange, onBusyChange };
  });
  useEffect(() => {
    report.current.onChange(items.flatMap((i) => (i.photo ? [i.photo.id] : [])));
    report.current.onBusyChange?.(items.some((i) => !i.photo && !i.error));
  }, [items]);

  const itemsRef = useRef(items);
  useEffect(() => {
    itemsRef.current = items;
  }, [items]);
  useEffect(
    () => () => {
      for (const i of itemsRef.current) i.abort.abort();
    },
    [],
  );

  const add = (files: File[]) => {
    for (const file of files.slice(0, Math.max(0, max - items.length))) {
      const item: Item = {
        key: nextKey.current++,
        file,
        preview: previews.make(file),
        progress: 0,
        abort: new AbortController(),
      };
      setItems((all) => [...all, item]);
      if (file.size > photoMaxBytes) {
        update(item.key, { error: `Larger than ${megabytes} MB.` });
        continue;
      }
      uploadPhoto
        .mutateAsync({ file, signal: item.abort.signal, onProgress: (progress) => update(item.key, { progress }) })
        .then((photo) => update(item.key, { photo, progress: 1 }))
        .catch((error: unknown) => {
          if (!item.abort.signal.aborted) update(item.key, { error: errorMessage(error) });
        });
    }
  };

  const remove = (item: Item) => {
    item.abort.abort();
    previews.release(item.preview);
    setItems((all) => all.filter((i) => i.key !== item.key));
  };

  return (
    <div className="flex flex-col gap-3">
      <PhotoFileInput label={label} full={items.length >= max} className="min-h-touch py-4" onPick={add} />
      <p className="text-sm text-muted">
        JPEG, PNG or WebP, up to {megabytes} MB each, at most {max}. On iPhone choose the “Most Compatible” camera
        format.
      </p>
      {items.length > 0 && (
        <ul className="grid grid-cols-2 gap-3 sm:grid-cols-3" aria-label="Photos">
          {items.map((item) => (
            <li key={item.key} className="flex flex-col gap-1 rounded-md border border-line bg-surface-raised p-2">
              <img
                src={item.preview}
                alt={`Preview of ${item.file.name}`}
                className="aspect-square w-full rounded object-cover"
              />
              <span className="truncate text-sm" title={item.file.name}>
                {item.file.name}
              </span>
              {item.error ? (
                <p role="alert" className="text-sm font-medium text-danger">
                  {item.error}
                </p>
              ) : (
                <progress
                  className="h-2 w-full accent-accent"
                  max={1}
                  value={item.progress}
                  aria-label={item.photo ? `${item.file.name} uploaded` : `Uploading ${item.file.name}`}
                />
              )}
              {item.photo && <span className="text-sm font-medium text-ok">Uploaded</span>}
              <Button variant="ghost" className="min-h-0 px-2 py-1 text-sm" onClick={() => remove(item)}>
                Remove
              </Button>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
