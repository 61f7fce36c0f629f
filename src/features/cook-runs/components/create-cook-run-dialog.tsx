import { useQuery } from '@tanstack/react-query';
import { useId } from 'react';
import { useNavigate } from 'react-router';
import { createCookRunSchema, defaultGaugeKPa, type CreateCookRunInput } from '../../../../shared/schemas/cook-runs';
import { kPaToPsi } from '../../../../shared/stats/steam';
import { FormDialog } from '../../../components/ui/form-dialog';
import { OperatorChoice } from '../../../components/ui/operator-choice';
import { controlClasses, Field } from '../../../components/ui/field';
import { SuggestedCodeInput } from '../../../components/ui/suggested-code-input';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
import { cookRunsQueries } from '../api/cook-runs-queries';
import { useCreateCookRun } from '../api/use-create-cook-run';
import { PressureCaution } from './pressure-caution';

const fields = [
  'code',
  'cookedOn',
  'startedAt',
  'vessel',
  'container',
  'minutesAtPressure',
  'gaugeKPa',
  'ventingMinutes',
  'altitudeM',
  'loadCount',
  'operatorId',
  'operatorName',
  'notes',
] as const;

const number = (v: unknown) => (v === '' || v === null || v === undefined ? undefined : Number(v));
const optionalNumber = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v));
// datetime-local has no zone; the browser's own zone is the lab floor's, so it is read as local time.
const localDateTime = (v: unknown) => (typeof v === 'string' && v ? new Date(v).toISOString() : null);

interface Props {
  open: boolean;
  onClose: () => void;
  me: { id: number; displayName: string };
}

export function CreateCookRunDialog({ open, onClose, me }: Props) {
  const listId = useId();
  const createRun = useCreateCookRun();
  const nextCode = useQuery({ ...cookRunsQueries.nextCode(), enabled: open });
  const toast = useToast();
  const navigate = useNavigate();
  const defaults: CreateCookRunInput = {
    code: '',
    cookedOn: '',
    container: '1 L jar',
    minutesAtPressure: 90,
    gaugeKPa: defaultGaugeKPa,
    altitudeM: 0,
    operatorId: me.id,
  };

  return (
    <FormDialog
      open={open}
      onClose={onClose}
      pending={createRun.isPending}
      title="New cook run"
      description="One load through the cooker or autoclave. Minutes at pressure mean little without the container, so both are required."
      submitLabel="Record cook run"
      submitIcon="plus"
      intro={<PressureCaution />}
      schema={createCookRunSchema}
      options={{ defaultValues: defaults }}
      serverFields={fields}
      onSubmit={async (values) => {
        const run = await createRun.mutateAsync(values);
        toast.success(`Cook run ${run.code} recorded.`);
        onClose();
        void navigate(paths.cookRun.to(run.id));
      }}
    >
      {({ register, watch, setValue, formState: { errors, dirtyFields } }) => {
        const gauge = watch('gaugeKPa');
        const byUser = watch('operatorId') === me.id;
        return (
          <>
            <div className="grid gap-4 sm:grid-cols-2">
              <SuggestedCodeInput
                suggestion={nextCode.data?.code}
                edited={Boolean(dirtyFields.code)}
                onSuggestion={(code) => setValue('code', code)}
                error={errors.code?.message}
                {...register('code')}
              />
              <TextInput
                label="Vessel"
                optional
                placeholder="Cooker A"
                error={errors.vessel?.message}
                {...register('vessel')}
              />
              <TextInput
                label="Date"
                type="date"
                hint="Or give the start time."
                error={errors.cookedOn?.message}
                {...register('cookedOn', { setValueAs: (v: unknown) => v || null })}
              />
              <TextInput
                label="Start time"
                type="datetime-local"
                optional
                error={errors.startedAt?.message}
                {...register('startedAt', { setValueAs: localDateTime })}
              />
              <TextInput
                label="Container"
                list={listId}
                hint="1 L jar, 2 L jar, 3 kg bag…"
                error={errors.container?.message}
                {...register('container')}
              />
              <datalist id={listId}>
                <option value="1 L jar" />
                <option value="2 L jar" />
                <option value="3 kg bag" />
              </datalist>
              <TextInput
                label="Load count"
                type="number"
                inputMode="numeric"
                optional
                error={errors.loadCount?.message}
                {...register('loadCount', { setValueAs: optionalNumber })}
              />
              <TextInput
                label="Minutes at pressure"
                type="number"
                inputMode="numeric"
                error={errors.minutesAtPressure?.message}
                {...register('minutesAtPressure', { setValueAs: number })}
              />
              <TextInput
                label="Gauge pressure (kPa)"
                type="number"
                step="0.1"
                inputMode="decimal"
                optional
                hint={
                  typeof gauge === 'number' && !Number.isNaN(gauge)
                    ? `${kPaToPsi(gauge).toFixed(2)} psi`
                    : 'Left empty, 103.4 kPa (15 psi) is assumed.'
                }
                error={errors.gaugeKPa?.message}
                {...register('gaugeKPa', { setValueAs: optionalNumber })}
              />
              <TextInput
                label="Venting minutes"
                type="number"
                inputMode="numeric"
                optional
                hint="Steam flowing before the vent was closed."
                error={errors.ventingMinutes?.message}
                {...register('ventingMinutes', { setValueAs: optionalNumber })}
              />
              <TextInput
                label="Site altitude (m)"
                type="number"
                inputMode="numeric"
                hint="Lower air pressure lowers the steam temperature at the same gauge reading."
                error={errors.altitudeM?.message}
                {...register('altitudeM', { setValueAs: number })}
              />
            </div>
            <OperatorChoice
              selfLabel="I ran it"
              selfName={me.displayName}
              bySelf={byUser}
              onChooseSelf={() => {
                setValue('operatorId', me.id);
                setValue('operatorName', undefined);
              }}
              onChooseOther={() => setValue('operatorId', undefined)}
              staffName={register('operatorName')}
              error={errors.operatorName?.message}
            />
            <Field label="Notes" optional error={errors.notes?.message}>
              {(control) => <textarea rows={3} className={controlClasses} {...control} {...register('notes')} />}
            </Field>
          </>
        );
      }}
    </FormDialog>
  );
}
