import type { ComponentPropsWithRef, ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { controlClasses, Field } from './field';

export interface SelectOption {
  value: string;
  label: string;
}

interface SelectProps extends Omit<ComponentPropsWithRef<'select'>, 'id' | 'children'> {
  label: ReactNode;
  options: readonly SelectOption[];
  hint?: ReactNode;
  error?: string;
  optional?: boolean;
}

export function Select({ label, options, hint, error, optional, className, ...props }: SelectProps) {
  return (
    <Field label={label} hint={hint} error={error} optional={optional} className={className}>
      {(control) => (
        <select className={cx(controlClasses, 'cursor-pointer pr-8')} {...control} {...props}>
          {options.map((option) => (
            <option key={option.value} value={option.value}>
              {option.label}
            </option>
          ))}
        </select>
      )}
    </Field>
  );
}
