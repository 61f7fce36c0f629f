import { z } from 'zod';
import {
  createRetrainRequestSchema,
  trainingRecordFieldsSchema,
  type OperatorRowDto,
} from '../../../../shared/schemas/training';
import { TextField } from '../../../components/ui/form-fields';
import { FormDialog } from '../../../components/ui/form-dialog';
import { useToast } from '../../../components/ui/toast';
import { useRecordTraining } from '../api/use-record-training';
import { useRequestRetraining } from '../api/use-request-retraining';
import { todayIso } from '../../../lib/format';

interface PersonDialogProps {
  person: OperatorRowDto | null;
  versionId: number;
  version: number;
  onClose: () => void;
}

const trainingForm = trainingRecordFieldsSchema.pick({ trainedOn: true, notes: true });
const retrainForm = z.object({ reason: createRetrainRequestSchema.shape.reason });

export function RecordTrainingDialog({ person, versionId, version, onClose }: PersonDialogProps) {
  const record = useRecordTraining();
  const toast = useToast();
  return (
    <FormDialog
      open={person !== null}
      onClose={onClose}
      pending={record.isPending}
      title={person ? `Record training: ${person.displayName}` : 'Record training'}
      description={`On version ${version}, with you as the trainer. Open retraining requests for this procedure close with it.`}
      submitLabel="Record training"
      schema={trainingForm}
      options={{ defaultValues: { trainedOn: todayIso(), notes: '' } }}
      serverFields={['trainedOn', 'notes']}
      onSubmit={async (values) => {
        if (!person) return;
        await record.mutateAsync({ ...values, ...personIds(person), procedureVersionId: versionId });
        toast.success(`${person.displayName} is recorded as trained on version ${version}.`);
        onClose();
      }}
    >
      {(form) => (
        <>
          <TextField form={form} name="trainedOn" label="Trained on" type="date" />
          <TextField form={form} name="notes" label="Notes" optional />
        </>
      )}
    </FormDialog>
  );
}

/** A user or a staff person without an account: the server takes exactly one of the two ids. */
const personIds = (p: { userId: number | null; staffId: number | null }) =>
  p.userId !== null ? { userId: p.userId } : { staffId: p.staffId ?? undefined };

export function RetrainDialog({ person, versionId, version, onClose }: PersonDialogProps) {
  const request = useRequestRetraining();
  const toast = useToast();
  return (
    <FormDialog
      open={person !== null}
      onClose={onClose}
      pending={request.isPending}
      title={person ? `Ask ${person.displayName} to retrain` : 'Ask to retrain'}
      description={
        person?.staffId !== null && person?.staffId !== undefined
          ? `On version ${version}. ${person.displayName} has no account: tell them yourself; the request stays on record until they are trained.`
          : `On version ${version}. They get an e-mail with your reason and the steps, unless they turned that mail off.`
      }
      submitLabel="Send request"
      schema={retrainForm}
      options={{ defaultValues: { reason: '' } }}
      serverFields={['reason']}
      onSubmit={async (values) => {
        if (!person) return;
        const made = await request.mutateAsync({
          reason: values.reason,
          ...personIds(person),
          procedureVersionId: versionId,
        });
        toast.success(
          made.mailed
            ? `Request sent to ${person.displayName} by e-mail.`
            : `Request recorded; ${person.displayName} gets no e-mail for it.`,
        );
        onClose();
      }}
    >
      {(form) => <TextField form={form} name="reason" label="Reason" />}
    </FormDialog>
  );
}
