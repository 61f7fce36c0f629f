import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import type { createJarBatchSchema } from '../../../../shared/schemas/jars';
import { Button } from '../../../components/ui/button';
import type { FormMethods } from '../../../components/ui/form';
import { SelectField, TextField } from '../../../components/ui/form-fields';
import { TextInput } from '../../../components/ui/text-input';
import { errorMessage } from '../../../lib/api-client';
import { numberOrUndefined, textOrUndefined } from '../../../lib/form-values';
import { jarsQueries } from '../api/jars-queries';
import { cultureOptions, cultureWarning, type CultureChoice } from '../culture-choice';

const pick = (items: { id: number; label: string }[], none: string) => [
  { value: '', label: none },
  ...items.map((i) => ({ value: String(i.id), label: i.label })),
];

interface Props {
  methods: FormMethods<typeof createJarBatchSchema>;
  cultures: CultureChoice[];
}

/** Where a batch's inoculum came from: a culture from the picker, or a parent jar found by its label. */
export function InoculumFields({ methods, cultures }: Props) {
  const queryClient = useQueryClient();
  const [fromJar, setFromJar] = useState(false);
  const {
    register,
    setValue,
    setError,
    clearErrors,
    watch,
    formState: { errors },
  } = methods;
  const warning = cultureWarning(cultures.find((c) => c.id === Number(watch('cultureId'))));
  return (
    <fieldset className="space-y-3">
      <legend className="font-medium">Inoculated from</legend>
      <div className="flex gap-3">
        <Button
          variant={fromJar ? 'secondary' : 'primary'}
          aria-pressed={!fromJar}
          onClick={() => {
            setFromJar(false);
            setValue('parentJarId', undefined);
          }}
        >
          A culture
        </Button>
        <Button
          variant={fromJar ? 'primary' : 'secondary'}
          aria-pressed={fromJar}
          onClick={() => {
            setFromJar(true);
            setValue('cultureId', undefined);
          }}
        >
          A parent jar
        </Button>
      </div>
      {fromJar ? (
        <>
          <input type="hidden" {...register('parentJarId', { setValueAs: numberOrUndefined })} />
          <TextInput
            label="Parent jar label"
            autoComplete="off"
            error={errors.parentJarId?.message}
            onBlur={async (e) => {
              const label = e.target.value.trim();
              if (!label) return setValue('parentJarId', undefined);
              try {
                const story = await queryClient.fetchQuery(jarsQueries.byLabel(label));
                setValue('parentJarId', story.jar.id);
                clearErrors('parentJarId');
              } catch (error) {
                setValue('parentJarId', undefined);
                setError('parentJarId', { type: 'server', message: errorMessage(error) });
              }
            }}
          />
        </>
      ) : (
        <SelectField
          form={methods}
          name="cultureId"
          label="Culture"
          options={pick(cultureOptions(cultures), 'Choose a culture')}
          hint={
            warning ? (
              <span role="status" className="font-medium text-warn">
                <span aria-hidden="true">⚠ </span>
                {warning}
              </span>
            ) : (
              'Retired cultures are not offered.'
            )
          }
          setValueAs={numberOrUndefined}
        />
      )}
      <TextField
        form={methods}
        name="inoculumMl"
        label="Inoculum per jar (ml)"
        type="number"
        inputMode="decimal"
        step="0.1"
        optional
        setValueAs={textOrUndefined}
      />
    </fieldset>
  );
}
