import { useId, type ComponentPropsWithRef, type ReactNode } from 'react';
import { cx } from '../../lib/cx';

interface CheckboxProps extends Omit<ComponentPropsWithRef<'input'>, 'id' | 'type'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
}

export function Checkbox({ label, hint, error, className, ...props }: CheckboxProps) {
  const id = useId();
  const describedBy = [error && `${id}-error`, hint && `${id}-hint`].filter(Boolean).join(' ') || undefined;
  return (
    <div className={cx('flex flex-col gap-1', className)}>
      {/* The whole row is the label so the touch target stays at least 44 px tall. */}
      <label htmlFor={id} className="flex min-h-touch cursor-pointer items-center gap-3 font-medium">
        <input
          id={id}
          type="checkbox"
          aria-describedby={describedBy}
          aria-invalid={error ? true : undefined}
          className="size-6 shrink-0 cursor-pointer accent-accent"
          {...props}
        />
        {label}
      </label>
      {hint && (
        <p id={`${id}-hint`} className="pl-9 text-sm text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="pl-9 text-sm font-medium text-danger">
          {error}
        </p>
      )}
    </div>
  );
}
