import type { ComponentPropsWithoutRef, ReactNode } from 'react';
import type { FieldValues, Path, RegisterOptions, UseFormReturn } from 'react-hook-form';
import { numberOrNull, numberOrUndefined } from '../../lib/form-values';
import { controlClasses, Field } from './field';
import { Select, type SelectOption } from './select';
import { TextInput } from './text-input';

/** The part of a form's methods a field needs; the field's name is checked against the form's values. */
type FormOf<T extends FieldValues> = Pick<UseFormReturn<T>, 'register' | 'getFieldState' | 'formState'>;

interface BoundProps<T extends FieldValues> {
  form: FormOf<T>;
  name: Path<T>;
  label: ReactNode;
  hint?: ReactNode;
  optional?: boolean;
  className?: string;
  /** Turns the box's text into the value the schema expects. */
  setValueAs?: (value: unknown) => unknown;
  /** Runs after react-hook-form has taken the change. */
  onValueChange?: () => void;
}

type Bound<T extends FieldValues, E extends 'input' | 'select' | 'textarea'> = BoundProps<T> &
  Omit<ComponentPropsWithoutRef<E>, keyof BoundProps<T> | 'id' | 'onChange' | 'onBlur' | 'children'>;

function bind<T extends FieldValues>({ form, name, setValueAs, onValueChange }: BoundProps<T>) {
  const options = { setValueAs, onChange: onValueChange } as RegisterOptions<T, Path<T>>;
  return { error: form.getFieldState(name, form.formState).error?.message, ...form.register(name, options) };
}

/** A text box of a react-hook-form form: label, hint and the field's own error, wired for screen readers. */
export function TextField<T extends FieldValues>(props: Bound<T, 'input'>) {
  const { form, name, setValueAs, onValueChange, ...input } = props;
  return <TextInput {...input} {...bind({ form, name, label: input.label, setValueAs, onValueChange })} />;
}

/** A number box; emptied, it gives null for an optional field and undefined for a required one. */
export function NumberField<T extends FieldValues>(props: Omit<Bound<T, 'input'>, 'setValueAs' | 'type'>) {
  const { form, name, onValueChange, ...input } = props;
  const setValueAs = input.optional ? numberOrNull : numberOrUndefined;
  return (
    <TextInput
      type="number"
      inputMode={input.step ? 'decimal' : 'numeric'}
      {...input}
      {...bind({ form, name, label: input.label, setValueAs, onValueChange })}
    />
  );
}

/** A drop-down of a react-hook-form form. */
export function SelectField<T extends FieldValues>(props: Bound<T, 'select'> & { options: readonly SelectOption[] }) {
  const { form, name, setValueAs, onValueChange, ...select } = props;
  return <Select {...select} {...bind({ form, name, label: select.label, setValueAs, onValueChange })} />;
}

/** A multi-line box of a react-hook-form form. */
export function TextAreaField<T extends FieldValues>(props: Bound<T, 'textarea'>) {
  const { form, name, setValueAs, onValueChange, label, hint, optional, className, rows = 3, ...area } = props;
  const { error, ...registered } = bind({ form, name, label, setValueAs, onValueChange });
  return (
    <Field label={label} hint={hint} optional={optional} error={error} className={className}>
      {(control) => <textarea rows={rows} className={controlClasses} {...area} {...control} {...registered} />}
    </Field>
  );
}

/** A username box: phones must not capitalise or correct what is typed. */
export function UsernameField<T extends FieldValues>(props: Omit<Bound<T, 'input'>, 'label'> & { label?: ReactNode }) {
  return <TextField label="Username" autoCapitalize="none" autoCorrect="off" spellCheck={false} {...props} />;
}

export function PasswordField<T extends FieldValues>(props: Omit<Bound<T, 'input'>, 'type'>) {
  return <TextField type="password" {...props} />;
}
