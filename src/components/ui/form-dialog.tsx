import { useId, type ReactNode } from 'react';
import type { FieldValues, Path, UseFormProps } from 'react-hook-form';
import type { z } from 'zod';
import { Button, type ButtonVariant } from './button';
import { Dialog } from './dialog';
import { applyServerErrors, Form, type FormMethods } from './form';
import type { IconName } from './icon';
import { useToast } from './toast';

type Schema = z.ZodType<FieldValues, FieldValues>;

export interface FormDialogProps<S extends Schema> {
  open: boolean;
  onClose: () => void;
  title: string;
  description?: ReactNode;
  size?: 'sm' | 'md';
  /** The request is running: buttons wait and Escape is refused. */
  pending: boolean;
  submitLabel: ReactNode;
  submitIcon?: IconName;
  submitVariant?: ButtonVariant;
  /** Focus Cancel first, for changes that are hard to undo. */
  focusCancel?: boolean;
  /** Shown above the form, such as a safety caution. */
  intro?: ReactNode;
  schema: S;
  options?: Omit<UseFormProps<z.input<S>, unknown, z.output<S>>, 'resolver'>;
  /** Remounts the form, and so its defaults, when it changes. */
  formKey?: string;
  /** Fields the server's issues go back on; the rest become the form's message. */
  serverFields: readonly Path<z.input<S>>[];
  /** A throw puts the server's errors on the form. */
  onSubmit: (values: z.output<S>, methods: FormMethods<S>) => void | Promise<void>;
  children: (methods: FormMethods<S>) => ReactNode;
}

/** A dialog holding one form: Cancel and submit along the bottom, server errors put back on fields. */
export function FormDialog<S extends Schema>(props: FormDialogProps<S>) {
  const { open, onClose, title, description, size, pending, intro, schema, options, formKey, serverFields } = props;
  const formId = useId();
  return (
    <Dialog
      open={open}
      onClose={onClose}
      busy={pending}
      size={size}
      title={title}
      description={description}
      footer={
        <>
          <Button
            variant="secondary"
            onClick={onClose}
            disabled={pending}
            data-autofocus={props.focusCancel || undefined}
          >
            Cancel
          </Button>
          <Button type="submit" form={formId} pending={pending} icon={props.submitIcon} variant={props.submitVariant}>
            {props.submitLabel}
          </Button>
        </>
      }
    >
      {intro && <div className="mb-5">{intro}</div>}
      <Form
        id={formId}
        key={formKey}
        schema={schema}
        options={options}
        onSubmit={async (values, methods) => {
          try {
            await props.onSubmit(values, methods);
          } catch (error) {
            applyServerErrors(error, methods.setError, serverFields);
          }
        }}
      >
        {props.children}
      </Form>
    </Dialog>
  );
}

interface SaveDialogProps<S extends Schema, R> extends Omit<FormDialogProps<S>, 'pending' | 'onSubmit'> {
  /** Where the form's values go; its pending state holds the buttons. */
  mutation: { isPending: boolean; mutateAsync: (values: z.output<S>) => Promise<R> };
  /** The toast once the server has the record. */
  saved: (result: R) => string;
  /** Runs after the dialog has closed, such as opening the new record's page. */
  then?: (result: R) => void;
}

/** A form dialog that sends its values to one mutation, then says so, closes and moves on. */
export function SaveDialog<S extends Schema, R>({ mutation, saved, then, ...dialog }: SaveDialogProps<S, R>) {
  const toast = useToast();
  return (
    <FormDialog
      {...dialog}
      pending={mutation.isPending}
      onSubmit={async (values) => {
        const result = await mutation.mutateAsync(values);
        toast.success(saved(result));
        dialog.onClose();
        then?.(result);
      }}
    />
  );
}
