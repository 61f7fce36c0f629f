import { useId, type ReactNode } from 'react';
import { cx } from '../../lib/cx';

export interface ControlProps {
  id: string;
  'aria-describedby'?: string;
  'aria-invalid'?: true;
}

interface FieldProps {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  /** Shows "optional" beside the label; required is the norm. */
  optional?: boolean;
  className?: string;
  children: (control: ControlProps) => ReactNode;
}

const sentence = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

export function Field({ label, hint, error, optional, className, children }: FieldProps) {
  const id = useId();
  const hintId = `${id}-hint`;
  const errorId = `${id}-error`;
  const describedBy = [error && errorId, hint && hintId].filter(Boolean).join(' ') || undefined;

  return (
    <div className={cx('flex flex-col gap-1.5', className)}>
      <label htmlFor={id} className="font-medium">
        {label}
        {optional && <span className="ml-1 font-normal text-muted">(optional)</span>}
      </label>
      {hint && (
        <p id={hintId} className="text-sm text-muted">
          {hint}
        </p>
      )}
      {children({ id, 'aria-describedby': describedBy, 'aria-invalid': error ? true : undefined })}
      {error && (
        <p id={errorId} className="text-sm font-medium text-danger">
          {sentence(error)}
        </p>
      )}
    </div>
  );
}

export const controlClasses = cx(
  'min-h-touch w-full rounded-md border-2 border-line-strong bg-surface-raised px-3 py-2 text-base text-ink',
  'placeholder:text-muted disabled:cursor-not-allowed disabled:bg-surface-sunken',
  'aria-invalid:border-danger',
);
