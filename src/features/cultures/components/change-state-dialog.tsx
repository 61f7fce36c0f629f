import { useId } from 'react';
import type { CultureState } from '../../../../shared/enums';
import { changeCultureStateSchema } from '../../../../shared/schemas/cultures';
import { Button } from '../../../components/ui/button';
import { Dialog } from '../../../components/ui/dialog';
import { controlClasses, Field } from '../../../components/ui/field';
import { applyServerErrors, Form } from '../../../components/ui/form';
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
  const formId = useId();
  const change = useChangeCultureState(culture.id);
  const toast = useToast();
  const close = () => {
    change.reset();
    onClose();
  };

  return (
    <Dialog
      open={target !== null}
      onClose={close}
      busy={change.isPending}
      size="sm"
      title={target ? `${verbs[target]} ${culture.code}?` : ''}
      description={
        target &&
        `From ${cultureStateLabels[culture.state].toLowerCase()} to ${cultureStateLabels[target].toLowerCase()}.`
      }
      footer={
        <>
          <Button variant="secondary" onClick={close} disabled={change.isPending} data-autofocus>
            Cancel
          </Button>
          <Button
            type="submit"
            form={formId}
            pending={change.isPending}
            variant={target === 'retired' ? 'danger' : 'primary'}
          >
            {target ? verbs[target] : 'Change'}
          </Button>
        </>
      }
    >
      {target && (
        <Form
          id={formId}
          schema={changeCultureStateSchema}
          options={{ defaultValues: { state: target, reason: '' } }}
          onSubmit={async (values, { setError }) => {
            try {
              await change.mutateAsync(values);
              toast.success(`${culture.code} is now ${cultureStateLabels[values.state].toLowerCase()}.`);
              close();
            } catch (error) {
              applyServerErrors(error, setError, ['reason', 'state']);
            }
          }}
        >
          {({ register, formState: { errors } }) => (
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
              <Field label="Reason" hint="Kept in the audit trail." error={errors.reason?.message}>
                {(control) => <textarea rows={3} className={controlClasses} {...control} {...register('reason')} />}
              </Field>
            </>
          )}
        </Form>
      )}
    </Dialog>
  );
}
