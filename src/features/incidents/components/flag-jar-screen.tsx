import { useState } from 'react';
import { Link, useLocation, useNavigate } from 'react-router';
import { contaminants } from '../../../../shared/enums';
import { Button } from '../../../components/ui/button';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
import { sendFlag } from '../flag-outbox';
import { flagFormSchema, onFlagForm, splitLabels, toCreateInput, type FlagFormInput } from '../flag-form';
import { contaminantShortNames } from '../labels';
import { ChoiceTiles } from './choice-tiles';
import { CompactCautions } from './compact-cautions';
import { FlagDetails } from './flag-details';
import { HeldPhotos, type HeldPhoto } from './held-photos';
import { OpenIncidentNotice } from './open-incident-notice';

const formFields = ['jarText', 'contaminant', 'severity', 'stage', 'notes', 'foundAt'] as const;

export interface OpenIncident {
  id: number;
  foundOn: string;
  label: string;
}

interface Props {
  jarLabel: string | undefined;
  /** The jar's incident that is still open, if it has one: a second flag is most often a mistake. */
  openIncident?: OpenIncident;
}

/** With or without signal: the flag goes to the outbox on the phone and is sent from there. */
export function FlagJarScreen({ jarLabel, openIncident }: Props) {
  const navigate = useNavigate();
  const back = (useLocation().state as { back?: string } | null)?.back;
  const toast = useToast();
  const [photos, setPhotos] = useState<HeldPhoto[]>([]);
  const refused = photos.some((p) => p.refusal);
  const checking = photos.some((p) => p.refusal === undefined);

  return (
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
      className="mx-auto max-w-2xl gap-4 pb-28"
      aria-label="Flag a jar"
      onSubmit={async (values, { setError }) => {
        if (refused || checking) return;
        try {
          const { photoIds: _none, ...input } = toCreateInput(values);
          const outcome = await sendFlag(input, photos);
          const jars = input.jarLabels?.join(', ') ?? '';
          if (outcome.sent) toast.success(`Incident ${outcome.incidentId} recorded for ${jars}.`);
          else toast.success(`No connection: the flag of ${jars} is kept on this phone and sends itself later.`);
          if (back) void navigate(back);
          else if (outcome.sent) void navigate(paths.incident.to(outcome.incidentId));
          else void navigate(paths.outbox.to());
        } catch (error) {
          applyServerErrors(onFlagForm(error), setError, formFields);
        }
      }}
    >
      {(form) => {
        const {
          register,
          watch,
          setValue,
          formState: { errors, isSubmitting },
        } = form;
        const labels = splitLabels(watch('jarText') ?? '');
        return (
          <>
            <h1 className="text-2xl font-semibold">Flag a jar</h1>
            <TextInput
              label="Jar label"
              hint={labels.length > 1 ? `${labels.length} jars: ${labels.join(', ')}` : undefined}
              autoComplete="off"
              autoCapitalize="characters"
              spellCheck={false}
              error={errors.jarText?.message}
              {...register('jarText')}
            />
            {openIncident && <OpenIncidentNotice incident={openIncident} files={photos} blocked={refused} />}
            <ChoiceTiles
              legend="What is growing?"
              name="contaminant"
              columns="grid-cols-3"
              options={contaminants.map((c) => ({ value: c, label: contaminantShortNames[c] }))}
              value={watch('contaminant')}
              onChange={(v) => v && setValue('contaminant', v, { shouldValidate: true })}
              error={errors.contaminant ? 'Pick what you see; “unknown” is fine.' : undefined}
            />
            <HeldPhotos photos={photos} onChange={setPhotos} />
            <CompactCautions />
            <FlagDetails form={form} />
            <p className="text-sm text-muted">
              Flags are kept on this phone until the server has them.{' '}
              <Link className="text-accent underline" to={paths.outbox.to()}>
                Waiting to send
              </Link>
            </p>
            <div className="fixed inset-x-0 bottom-16 z-30 border-t border-line bg-surface-raised/95 p-3 sm:static sm:border-0 sm:bg-transparent sm:p-0">
              {refused && (
                <p role="alert" className="mb-2 text-sm font-medium text-danger">
                  Remove or replace the refused photo to flag the jar.
                </p>
              )}
              <Button type="submit" className="w-full" pending={isSubmitting} disabled={refused || checking}>
                Flag jar
              </Button>
            </div>
          </>
        );
      }}
    </Form>
  );
}
