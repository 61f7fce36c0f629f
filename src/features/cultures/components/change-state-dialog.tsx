import type { CultureState } from '../../../../shared/enums';
import { changeCultureStateSchema } from '../../../../shared/schemas/cultures';
import { TextAreaField } from '../../../components/ui/form-fields';
import { FormDialog } from '../../../components/ui/form-dialog';
import { Notice } from '../../../components/ui/notice';
import { useToast } from '../../../components/ui/toast';
import { useChangeCultureState } from '../api/use-change-culture-state';
import { cultureStateLabels } from './culture-state-badge';

interface Props {
  culture: { id: number; code: string; state: CultureState; lastAgarResult: string | null };
  target: CultureState | null;
  onClose: () => void;
}

const verbs: Record<CultureState, string> = { quarantined: 'Quarantine', released: 'Release', retired: 'Retire' };

/** Every state change is confirmed and carries a reason, which the audit trail keeps. */
export function ChangeStateDialog({ culture, target, onClose }: Props) {
  const change = useChangeCultureState(culture.id);
  const toast = useToast();
  const close = () => {
    change.reset();
    onClose();
  };

  return (
    <FormDialog
      open={target !== null}
      onClose={close}
      pending={change.isPending}
      size="sm"
      title={target ? `${verbs[target]} ${culture.code}?` : ''}
      description={
        target &&
        `From ${cultureStateLabels[culture.state].toLowerCase()} to ${cultureStateLabels[target].toLowerCase()}.`
      }
      submitLabel={target ? verbs[target] : 'Change'}
      submitVariant={target === 'retired' ? 'danger' : 'primary'}
      focusCancel
      schema={changeCultureStateSchema}
      options={{ defaultValues: { state: target ?? undefined, reason: '' } }}
      serverFields={['reason', 'state']}
      onSubmit={async (values) => {
        await change.mutateAsync(values);
        toast.success(`${culture.code} is now ${cultureStateLabels[values.state].toLowerCase()}.`);
        close();
      }}
    >
      {(form) => (
        <>
          {target === 'released' && culture.lastAgarResult !== 'clean' && (
            <Notice tone="warn">
              {culture.lastAgarResult
                ? `The latest agar test was ${culture.lastAgarResult}.`
                : 'No agar test is recorded for this culture.'}{' '}
              Jars inoculated from a contaminated culture are lost together.
            </Notice>
          )}
          {target === 'retired' && <p>A retired culture cannot be released again.</p>}
          <TextAreaField form={form} name="reason" label="Reason" hint="Kept in the audit trail." />
        </>
      )}
    </FormDialog>
  );
}
