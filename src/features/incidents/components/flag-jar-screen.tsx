import { useState } from 'react';
import { useNavigate } from 'react-router';
import { contaminantNames, contaminants, stagesFound } from '../../../../shared/enums';
import { incidentSeverities, signSuggestions } from '../../../../shared/schemas/incidents';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { PageHeader } from '../../../components/ui/page-header';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
import { PhotoPicker } from '../../photos/components/photo-picker';
import { useCreateIncident } from '../api/use-incident-mutations';
import { flagFormSchema, onFlagForm, splitLabels, toCreateInput, type FlagFormInput } from '../flag-form';
import { severityLabels, stageLabels } from '../labels';
import { ChoiceTiles } from './choice-tiles';
import { NotesField } from './notes-field';
import { SporeCautions } from './spore-cautions';

const formFields = [
  'jarText',
  'contaminant',
  'severity',
  'stage',
  'signColour',
  'signSmell',
  'signTexture',
  'notes',
  'photoIds',
  'foundAt',
] as const;
const chips = (values: readonly string[]) => values.map((v) => ({ value: v, label: v }));

export function FlagJarScreen({ jarLabel }: { jarLabel: string | undefined }) {
  const create = useCreateIncident();
  const navigate = useNavigate();
  const toast = useToast();
  const [uploading, setUploading] = useState(false);

  return (
    <>
      <PageHeader title="Flag a jar" description="Pick what you see, add a photo, send. A supervisor reviews it." />
      <Form
        schema={flagFormSchema}
        options={{
          defaultValues: {
            jarText: jarLabel ?? '',
            severity: 'medium',
            stage: 'incubation',
            sealed: false,
            sterilisedBeforeDisposal: false,
            photoIds: [],
          } satisfies Partial<FlagFormInput>,
        }}
        className="mx-auto max-w-2xl pb-28"
        onSubmit={(values, { setError }) =>
          create.mutateAsync(toCreateInput(values)).then(
            (incident) => {
              toast.success(`Incident ${incident.id} recorded for ${incident.jars.map((j) => j.label).join(', ')}.`);
              void navigate(paths.incident.to(incident.id));
            },
            (error: unknown) => applyServerErrors(onFlagForm(error), setError, formFields),
          )
        }
      >
        {({ register, watch, setValue, formState: { errors } }) => {
          const labels = splitLabels(watch('jarText') ?? '');
          return (
            <>
              <SporeCautions compact />
              <TextInput
                label="Jar label"
                hint="Scan or type it. Several jars in one incident: separate the labels with spaces or commas."
                autoComplete="off"
                autoCapitalize="characters"
                spellCheck={false}
                error={errors.jarText?.message}
                {...register('jarText')}
              />
              {labels.length > 1 && (
                <p className="-mt-3 text-sm text-muted">
                  {labels.length} jars: {labels.join(', ')}
                </p>
              )}
              <ChoiceTiles
                legend="What is growing?"
                name="contaminant"
                options={contaminants.map((c) => ({ value: c, label: contaminantNames[c] }))}
                value={watch('contaminant')}
                onChange={(v) => v && setValue('contaminant', v, { shouldValidate: true })}
                error={errors.contaminant ? 'Pick what you see; “unknown” is fine.' : undefined}
              />
              <ChoiceTiles
                legend="Colour"
                name="signColour"
                size="chip"
                clearable
                options={chips(signSuggestions.signColour)}
                value={watch('signColour')}
                onChange={(v) => setValue('signColour', v)}
              />
              <ChoiceTiles
                legend="Smell"
                name="signSmell"
                size="chip"
                clearable
                options={chips(signSuggestions.signSmell)}
                value={watch('signSmell')}
                onChange={(v) => setValue('signSmell', v)}
              />
              <ChoiceTiles
                legend="Texture"
                name="signTexture"
                size="chip"
                clearable
                options={chips(signSuggestions.signTexture)}
                value={watch('signTexture')}
                onChange={(v) => setValue('signTexture', v)}
              />
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
              <PhotoPicker onChange={(ids) => setValue('photoIds', ids)} onBusyChange={setUploading} />
              <NotesField label="Notes" optional error={errors.notes?.message} {...register('notes')} />
              <div className="fixed inset-x-0 bottom-16 z-30 border-t border-line bg-surface-raised/95 p-3 sm:static sm:border-0 sm:bg-transparent sm:p-0">
                <Button type="submit" className="w-full" pending={create.isPending} disabled={uploading}>
                  {uploading ? 'Waiting for photos…' : 'Flag jar'}
                </Button>
              </div>
            </>
          );
        }}
      </Form>
    </>
  );
}
