import { z } from 'zod';
import { idSchema } from '../../../../shared/schemas/common';
import { stepLinkInputSchema, type ProcedureStepDto } from '../../../../shared/schemas/procedures';
import { FormDialog } from '../../../components/ui/form-dialog';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { useLinkStep } from '../api/use-link-step';

const linkFormSchema = z.object({ incidentId: idSchema, note: stepLinkInputSchema.shape.note });

export function LinkIncidentDialog({ step, onClose }: { step: ProcedureStepDto | null; onClose: () => void }) {
  const link = useLinkStep();
  const toast = useToast();
  return (
    <FormDialog
      open={step !== null}
      onClose={onClose}
      pending={link.isPending}
      title={step ? `Link an incident to step ${step.position}` : 'Link an incident'}
      description="Record the step you think was missed and what you suspect happened. It shows in the incident’s history."
      submitLabel="Link incident"
      schema={linkFormSchema}
      options={{ defaultValues: { incidentId: '' as unknown as number, note: '' } }}
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
            label="Incident number"
            inputMode="numeric"
            error={errors.incidentId?.message}
            {...register('incidentId')}
          />
          <TextInput label="Suspected lapse" error={errors.note?.message} {...register('note')} />
        </>
      )}
    </FormDialog>
  );
}
