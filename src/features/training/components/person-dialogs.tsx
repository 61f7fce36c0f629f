import { useId } from 'react';
import { z } from 'zod';
import { createRetrainRequestSchema, createTrainingRecordSchema, type OperatorRowDto } from '../../../../shared/schemas/training';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { useRecordTraining } from '../api/use-record-training';
import { useRequestRetraining } from '../api/use-request-retraining';

interface PersonDialogProps {
  person: OperatorRowDto | null;
  versionId: number;
  version: number;
  onClose: () => void;
}

const trainingForm = createTrainingRecordSchema.pick({ trainedOn: true, notes: true });
const retrainForm = z.object({ reason: createRetrainRequestSchema.shape.reason });
const today = () => new Date().toLocaleDateString('en-CA');

export function RecordTrainingDialog({ person, versionId, version, onClose }: PersonDialogProps) {
  const formId = useId();
  const record = useRecordTraining();
  const toast = useToast();
  return (
    <Dialog
      open={person !== null}
      onClose={onClose}
      busy={record.isPending}
      title={person ? `Record training: ${person.displayName}` : 'Record training'}
      description={`On version ${version}, with you as the trainer. Open retraining requests for this procedure close with it.`}
      footer={
        <>
          <Button variant="secondary" onClick={onClose} disabled={record.isPending}>
            Cancel
          </Button>
          <Button type="submit" form={formId} pending={record.isPending}>
            Record training
          </Button>
        </>
      }
    >
      {person && (
        <Form
          id={formId}
          schema={trainingForm}
          options={{ defaultValues: { trainedOn: today(), notes: '' } }}
          onSubmit={async (values, { setError }) => {
            try {
              await record.mutateAsync({ ...values, userId: person.userId, procedureVersionId: versionId });
              toast.success(`${person.displayName} is recorded as trained on version ${version}.`);
              onClose();
            } catch (error) {
              applyServerErrors(error, setError, ['trainedOn', 'notes']);
            }
          }}
        >
          {({ register, formState: { errors } }) => (
            <>
              <TextInput label="Trained on" type="date" error={errors.trainedOn?.message} {...register('trainedOn')} />
              <TextInput label="Notes" optional error={errors.notes?.message} {...register('notes')} />
            </>
          )}
        </Form>
      )}
    </Dialog>
  );
}

export function RetrainDialog({ person, versionId, version, onClose }: PersonDialogProps) {
  const formId = useId();
  const request = useRequestRetraining();
  const toast = useToast();
  return (
    <Dialog
      open={person !== null}
      onClose={onClose}
      busy={request.isPending}
      title={person ? `Ask ${person.displayName} to retrain` : 'Ask to retrain'}
      description={`On version ${version}. They get an e-mail with your reason and the steps, unless they turned that mail off.`}
      footer={
        <>
          <Button variant="secondary" onClick={onClose} disabled={request.isPending}>
            Cancel
          </Button>
          <Button type="submit" form={formId} pending={request.isPending}>
            Send request
          </Button>
        </>
      }
    >
      {person && (
        <Form
          id={formId}
          schema={retrainForm}
          options={{ defaultValues: { reason: '' } }}
          onSubmit={async (values, { setError }) => {
            try {
              const made = await request.mutateAsync({ reason: values.reason, userId: person.userId, procedureVersionId: versionId });
              toast.success(made.mailed ? `Request sent to ${person.displayName} by e-mail.` : `Request recorded; ${person.displayName} gets no e-mail for it.`);
              onClose();
            } catch (error) {
              applyServerErrors(error, setError, ['reason']);
            }
          }}
        >
          {({ register, formState: { errors } }) => <TextInput label="Reason" error={errors.reason?.message} {...register('reason')} />}
        </Form>
      )}
    </Dialog>
  );
}
