import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { z } from 'zod';
import { contaminantNames } from '../../../../shared/enums';
import { stepLinkInputSchema, type ProcedureStepDto } from '../../../../shared/schemas/procedures';
import { FormDialog } from '../../../components/ui/form-dialog';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { formatDate } from '../../../lib/format';
import { proceduresQueries } from '../api/procedures-queries';
import { useLinkStep } from '../api/use-link-step';

const linkFormSchema = z.object({
  incidentId: z.coerce
    .number<string>({ error: 'pick an incident from the list' })
    .int()
    .positive('pick an incident from the list'),
  note: stepLinkInputSchema.shape.note,
});

export function LinkIncidentDialog({ step, onClose }: { step: ProcedureStepDto | null; onClose: () => void }) {
  const link = useLinkStep();
  const toast = useToast();
  const [search, setSearch] = useState('');
  const choices = useQuery(proceduresQueries.incidentChoices(search));
  return (
    <FormDialog
      open={step !== null}
      onClose={onClose}
      pending={link.isPending}
      title={step ? `Link an incident to step ${step.position}` : 'Link an incident'}
      description="Find the incident, then record the step you think was missed and what you suspect happened. It shows in the incident’s history."
      submitLabel="Link incident"
      schema={linkFormSchema}
      options={{ defaultValues: { incidentId: '', note: '' } }}
      serverFields={['note']}
      onSubmit={async (values) => {
        if (!step) return;
        await link.mutateAsync({ incidentId: values.incidentId, stepId: step.id, note: values.note });
        toast.success(`Incident #${values.incidentId} linked to step ${step.position}.`);
        onClose();
      }}
    >
      {({ register, formState: { errors } }) => (
        <>
          <TextInput
            label="Find an incident"
            hint="Its number (#88 or 88), a jar label, an operator or a contaminant."
            type="search"
            value={search}
            onChange={(e) => setSearch(e.target.value)}
          />
          <fieldset className="flex flex-col gap-1">
            <legend className="mb-1 font-medium">Incident</legend>
            {search.trim() === '' && <p className="text-sm text-muted">Type above to list incidents.</p>}
            {choices.data?.items.length === 0 && <p className="text-sm text-muted">No incident matches.</p>}
            {choices.data?.items.map((i) => (
              <label key={i.id} className="flex min-h-touch items-center gap-3">
                <input type="radio" value={i.id} className="size-5 accent-accent" {...register('incidentId')} />
                <span>
                  <span className="font-semibold">#{i.id}</span> {contaminantNames[i.contaminant]} · found{' '}
                  {formatDate(i.foundOn)} · {i.jarLabels.join(', ')}
                </span>
              </label>
            ))}
            {errors.incidentId && (
              <p role="alert" className="text-sm text-danger">
                Pick an incident from the list.
              </p>
            )}
          </fieldset>
          <TextInput label="Suspected lapse" error={errors.note?.message} {...register('note')} />
        </>
      )}
    </FormDialog>
  );
}
