import type { ReactNode, RefObject } from 'react';
import { photoAcceptedTypes } from '../../../shared/schemas/photos';
import { Icon } from '../ui/icon';
import { cx } from '../../lib/cx';

interface PhotoFileInputProps {
  label: ReactNode;
  /** No room for another photo: the box is shown dimmed and refuses taps. */
  full: boolean;
  /** Height and padding of the box. */
  className: string;
  /** For a button elsewhere that opens the same camera, such as "Replace". */
  inputRef?: RefObject<HTMLInputElement | null>;
  onPick: (files: File[]) => void;
}

/** The dashed box that opens the camera or the photo library; on phones the back camera first. */
export function PhotoFileInput({ label, full, className, inputRef, onPick }: PhotoFileInputProps) {
  return (
    <label
      className={cx(
        'flex cursor-pointer items-center justify-center gap-2 rounded-md border-2 border-dashed border-line-strong px-4 font-semibold text-accent',
        className,
        full && 'pointer-events-none opacity-60',
      )}
    >
      <Icon name="plus" size={22} />
      {label}
      <input
        ref={inputRef}
        type="file"
        accept={photoAcceptedTypes.join(',')}
        capture="environment"
        multiple
        className="sr-only"
        disabled={full}
        onChange={(e) => {
          onPick(Array.from(e.target.files ?? []));
          // Emptied so that picking the same file again still fires a change.
          e.target.value = '';
        }}
      />
    </label>
  );
}
