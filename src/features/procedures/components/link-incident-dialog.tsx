import { useId } from 'react';
import { z } from 'zod';
import { idSchema } from '../../../../shared/schemas/common';
import { stepLinkInputSchema, type ProcedureStepDto } from '../../../../shared/schemas/procedures';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { useLinkStep } from '../api/use-link-step';

const linkFormSchema = z.object({ incidentId: idSchema, note: stepLinkInputSchema.shape.note });

export function LinkIncidentDialog({ step, onClose }: { step: ProcedureStepDto | null; onClose: () => void }) {
  const formId = useId();
  const link = useLinkStep();
  const toast = useToast();
  return (
    <Dialog
      open={step !== null}
      onClose={onClose}
      busy={link.isPending}
      title={step ? `Link an incident to step ${step.position}` : 'Link an incident'}
      description="Record the step you think was missed and what you suspect happened. It shows in the incident’s history."
      footer={
        <>
          <Button variant="secondary" onClick={onClose} disabled={link.isPending}>
            Cancel
          </Button>
          <Button type="submit" form={formId} pending={link.isPending}>
            Link incident
          </Button>
        </>
      }
    >
      {step && (
        <Form
          id={formId}
          schema={linkFormSchema}
          options={{ defaultValues: { incidentId: '' as unknown as number, note: '' } }}
          onSubmit={async (values, { setError }) => {
            try {
              await link.mutateAsync({ incidentId: values.incidentId, stepId: step.id, note: values.note });
              toast.success(`Incident #${values.incidentId} linked to step ${step.position}.`);
              onClose();
            } catch (error) {
              applyServerErrors(error, setError, ['note']);
            }
          }}
        >
          {({ register, formState: { errors } }) => (
            <>
              <TextInput label="Incident number" inputMode="numeric" error={errors.incidentId?.message} {...register('incidentId')} />
              <TextInput label="Suspected lapse" error={errors.note?.message} {...register('note')} />
            </>
          )}
        </Form>
      )}
    </Dialog>
  );
}
