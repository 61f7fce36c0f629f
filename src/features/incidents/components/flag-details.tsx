import type { UseFormReturn } from 'react-hook-form';
import { stagesFound, incidentSeverities } from '../../../../shared/enums';
import { signSuggestions } from '../../../../shared/schemas/incidents';
import { Checkbox } from '../../../components/ui/checkbox';
import type { FlagFormInput, FlagFormValues } from '../flag-form';
import { severityLabels, stageLabels } from '../labels';
import { ChoiceTiles } from './choice-tiles';
import { NotesField } from './notes-field';

const chips = (values: readonly string[]) => values.map((v) => ({ value: v, label: v }));

/** Everything a flag may carry beyond what is growing and a photo: folded, so the phone shows the essentials. */
export function FlagDetails({ form }: { form: UseFormReturn<FlagFormInput, unknown, FlagFormValues> }) {
  const {
    register,
    watch,
    setValue,
    formState: { errors },
  } = form;
  const filled = [watch('signColour'), watch('signSmell'), watch('signTexture'), watch('notes')].filter(Boolean).length;
  return (
    <details className="rounded-md border border-line bg-surface-raised" open={Boolean(errors.notes)}>
      <summary className="flex min-h-touch cursor-pointer items-center px-3 font-medium">
        More details (optional){filled ? ` · ${filled} filled` : ''}
      </summary>
      <div className="flex flex-col gap-4 p-3 pt-1">
        {(['signColour', 'signSmell', 'signTexture'] as const).map((field) => (
          <ChoiceTiles
            key={field}
            legend={{ signColour: 'Colour', signSmell: 'Smell', signTexture: 'Texture' }[field]}
            name={field}
            size="chip"
            clearable
            options={chips(signSuggestions[field])}
            value={watch(field)}
            onChange={(v) => setValue(field, v)}
          />
        ))}
        <ChoiceTiles
          legend="Severity"
          name="severity"
          columns="grid-cols-3"
          options={incidentSeverities.map((s) => ({ value: s, label: severityLabels[s] }))}
          value={watch('severity')}
          onChange={(v) => v && setValue('severity', v)}
        />
        <ChoiceTiles
          legend="Found"
          name="stage"
          size="chip"
          options={stagesFound.map((s) => ({ value: s, label: stageLabels[s] }))}
          value={watch('stage')}
          onChange={(v) => v && setValue('stage', v)}
        />
        <fieldset className="flex flex-col gap-1">
          <legend className="mb-1 font-medium">Containment done</legend>
          <Checkbox label="Sealed (lid closed, tape over the port)" {...register('sealed')} />
          <Checkbox label="Sterilised before disposal" {...register('sterilisedBeforeDisposal')} />
        </fieldset>
        <NotesField label="Notes" optional error={errors.notes?.message} {...register('notes')} />
      </div>
    </details>
  );
}
