import { createAgarTestSchema } from '../../../../shared/schemas/cultures';
import { FormDialog } from '../../../components/ui/form-dialog';
import { controlClasses, Field } from '../../../components/ui/field';
import { Notice } from '../../../components/ui/notice';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { cautionFootnote } from '../../../config/cautions';
import { useAddAgarTest } from '../api/use-add-agar-test';
import { agarResults } from '../../../../shared/enums';

const resultOptions = agarResults.map((r) => ({ value: r, label: r.charAt(0).toUpperCase() + r.slice(1) }));
const optionalNumber = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v));

export function AgarTestDialog({
  cultureId,
  open,
  onClose,
}: {
  cultureId: number;
  open: boolean;
  onClose: () => void;
}) {
  const addTest = useAddAgarTest(cultureId);
  const toast = useToast();

  return (
    <FormDialog
      open={open}
      onClose={onClose}
      pending={addTest.isPending}
      title="Record an agar test"
      submitLabel="Save test"
      schema={createAgarTestSchema}
      options={{ defaultValues: { testedOn: new Date().toISOString().slice(0, 10), result: 'clean', notes: '' } }}
      serverFields={['testedOn', 'result', 'notes', 'photoId']}
      onSubmit={async (values) => {
        await addTest.mutateAsync(values);
        toast.success('Agar test recorded.');
        onClose();
      }}
    >
      {({ register, watch, formState: { errors } }) => (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <TextInput label="Tested on" type="date" error={errors.testedOn?.message} {...register('testedOn')} />
            <Select label="Result" options={resultOptions} error={errors.result?.message} {...register('result')} />
          </div>
          <TextInput
            label="Photo number"
            type="number"
            inputMode="numeric"
            optional
            hint="The number of a photo already uploaded."
            error={errors.photoId?.message}
            {...register('photoId', { setValueAs: optionalNumber })}
          />
          <Field label="Notes" optional error={errors.notes?.message}>
            {(control) => <textarea rows={3} className={controlClasses} {...control} {...register('notes')} />}
          </Field>
          {watch('result') === 'contaminated' && (
            <Notice tone="warn" title="Contaminated plate">
              Keep the plate sealed and sterilise it before disposal. Sporulating moulds can cause allergy; do not open
              it indoors. Follow your local biosafety and waste rules. {cautionFootnote}
            </Notice>
          )}
        </>
      )}
    </FormDialog>
  );
}
