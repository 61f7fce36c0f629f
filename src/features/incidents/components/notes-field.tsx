import type { ComponentPropsWithRef, ReactNode } from 'react';
import { controlClasses, Field } from '../../../components/ui/field';
import { cx } from '../../../lib/cx';

interface NotesFieldProps extends Omit<ComponentPropsWithRef<'textarea'>, 'id'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
}

export function NotesField({ label, hint, error, optional, className, rows = 3, ...props }: NotesFieldProps) {
  return (
    <Field label={label} hint={hint} error={error} optional={optional} className={className}>
      {(control) => <textarea rows={rows} className={cx(controlClasses, 'min-h-20')} {...control} {...props} />}
    </Field>
  );
}
