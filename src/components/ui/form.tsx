import { zodResolver } from '@hookform/resolvers/zod';
import type { FormHTMLAttributes, ReactNode } from 'react';
import {
  useForm,
  type FieldValues,
  type Path,
  type Resolver,
  type UseFormProps,
  type UseFormReturn,
  type UseFormSetError,
} from 'react-hook-form';
import type { z } from 'zod';
import { ApiError, errorMessage } from '../../lib/api-client';
import { cx } from '../../lib/cx';
import { Notice } from './notice';

type Schema = z.ZodType<FieldValues, FieldValues>;
export type FormMethods<S extends Schema> = UseFormReturn<z.input<S>, unknown, z.output<S>>;

interface FormProps<S extends Schema> extends Omit<FormHTMLAttributes<HTMLFormElement>, 'onSubmit' | 'children'> {
  schema: S;
  /** Gets the form's methods too, so a failed request can put errors back on fields. */
  onSubmit: (values: z.output<S>, methods: FormMethods<S>) => void | Promise<void>;
  options?: Omit<UseFormProps<z.input<S>, unknown, z.output<S>>, 'resolver'>;
  children: (methods: FormMethods<S>) => ReactNode;
}

export function Form<S extends Schema>({ schema, onSubmit, options, children, className, ...props }: FormProps<S>) {
  // zodResolver cannot infer through the generic schema, so the types it loses are restored here.
  const resolver = zodResolver(schema) as unknown as Resolver<z.input<S>, unknown, z.output<S>>;
  const methods = useForm<z.input<S>, unknown, z.output<S>>({ ...options, resolver });
  const formError = methods.formState.errors.root?.server?.message;
  return (
    <form
      noValidate
      className={cx('flex flex-col gap-5', className)}
      onSubmit={methods.handleSubmit((values) => onSubmit(values, methods))}
      {...props}
    >
      {/* Kept in the page while empty so screen readers announce the message when it appears. */}
      <div role="alert" aria-atomic="true">
        {formError && <Notice tone="danger">{formError}</Notice>}
      </div>
      {children(methods)}
    </form>
  );
}

/**
 * Puts the server's field issues on their fields. Issues for fields the form does not have, and errors
 * without issues, become the form-level message so nothing the server said is lost.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fields: readonly Path<T>[],
): void {
  const issues = error instanceof ApiError ? error.issues : [];
  const unplaced: string[] = [];
  let focused = false;
  for (const issue of issues) {
    const path = issue.path.replace(/^body\./, '') as Path<T>;
    if (fields.includes(path)) {
      setError(path, { type: 'server', message: issue.message }, { shouldFocus: !focused });
      focused = true;
    } else {
      unplaced.push(issue.path ? `${issue.path}: ${issue.message}` : issue.message);
    }
  }
  if (issues.length === 0 || unplaced.length > 0) {
    const message = unplaced.length > 0 ? unplaced.join(' · ') : errorMessage(error);
    setError('root.server', { type: 'server', message });
  }
}
