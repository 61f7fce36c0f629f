import { useFieldArray, type FieldValues, type UseFormReturn } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { TextInput } from '../../../components/ui/text-input';

interface StepsForm {
  steps: { text: string; caution?: string | null }[];
}

type StepsMethods = Pick<UseFormReturn<StepsForm, unknown, StepsForm>, 'control' | 'register' | 'formState'>;

/** Ordered steps, each with an optional caution; the order here is the order published. */
export function StepsEditor<T extends StepsForm & FieldValues>({
  form,
}: {
  form: Pick<UseFormReturn<T>, keyof StepsMethods>;
}) {
  // react-hook-form's types are invariant in the form shape; the constraint above makes sure it holds `steps`.
  const { control, register, formState } = form as unknown as StepsMethods;
  const errors = formState.errors;
  const { fields, append, remove, move } = useFieldArray({ control, name: 'steps' });
  return (
    <fieldset className="flex flex-col gap-4">
      <legend className="mb-2 font-semibold">Steps</legend>
      {errors.steps?.message && <p className="text-danger">{errors.steps.message}</p>}
      <ol className="flex flex-col gap-4">
        {fields.map((field, i) => (
          <li key={field.id} className="rounded-lg border border-line p-3">
            <TextInput
              label={`Step ${i + 1}`}
              error={errors.steps?.[i]?.text?.message}
              {...register(`steps.${i}.text`)}
            />
            <TextInput
              label={`Caution for step ${i + 1}`}
              optional
              className="mt-2"
              error={errors.steps?.[i]?.caution?.message}
              {...register(`steps.${i}.caution`)}
            />
            <div className="mt-2 flex flex-wrap gap-2">
              <Button variant="ghost" type="button" disabled={i === 0} onClick={() => move(i, i - 1)}>
                Move up
              </Button>
              <Button variant="ghost" type="button" disabled={i === fields.length - 1} onClick={() => move(i, i + 1)}>
                Move down
              </Button>
              <Button variant="ghost" type="button" disabled={fields.length === 1} onClick={() => remove(i)}>
                Remove step {i + 1}
              </Button>
            </div>
          </li>
        ))}
      </ol>
      <Button variant="secondary" type="button" icon="plus" onClick={() => append({ text: '', caution: '' })}>
        Add a step
      </Button>
    </fieldset>
  );
}

export type { StepsForm };
