import { createAgarTestSchema } from '../../../../shared/schemas/cultures';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { NumberField, SelectField, TextAreaField, TextField } from '../../../components/ui/form-fields';
import { Notice } from '../../../components/ui/notice';
import { cautionFootnote } from '../../../config/cautions';
import { useAddAgarTest } from '../api/use-add-agar-test';
import { agarResults } from '../../../../shared/enums';

const resultOptions = agarResults.map((r) => ({ value: r, label: r.charAt(0).toUpperCase() + r.slice(1) }));

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

  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={addTest}
      title="Record an agar test"
      submitLabel="Save test"
      schema={createAgarTestSchema}
      options={{ defaultValues: { testedOn: new Date().toISOString().slice(0, 10), result: 'clean', notes: '' } }}
      serverFields={['testedOn', 'result', 'notes', 'photoId']}
      saved={() => 'Agar test recorded.'}
    >
      {(form) => (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField form={form} name="testedOn" label="Tested on" type="date" />
            <SelectField form={form} name="result" label="Result" options={resultOptions} />
          </div>
          <NumberField
            form={form}
            name="photoId"
            label="Photo number"
            optional
            hint="The number of a photo already uploaded."
          />
          <TextAreaField form={form} name="notes" label="Notes" optional />
          {form.watch('result') === 'contaminated' && (
            <Notice tone="warn" title="Contaminated plate">
              Keep the plate sealed and sterilise it before disposal. Sporulating moulds can cause allergy; do not open
              it indoors. Follow your local biosafety and waste rules. {cautionFootnote}
            </Notice>
          )}
        </>
      )}
    </SaveDialog>
  );
}
