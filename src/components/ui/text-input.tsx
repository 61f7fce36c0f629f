import type { ComponentPropsWithRef, ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { controlClasses, Field } from './field';

interface TextInputProps extends Omit<ComponentPropsWithRef<'input'>, 'id'> {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
}

export function TextInput({ label, hint, error, optional, className, type = 'text', ...props }: TextInputProps) {
  return (
    <Field label={label} hint={hint} error={error} optional={optional} className={className}>
      {(control) => <input type={type} className={cx(controlClasses)} {...control} {...props} />}
    </Field>
  );
}
