import { useQuery } from '@tanstack/react-query';
import { useId } from 'react';
import { useNavigate } from 'react-router';
import { createCookRunSchema, defaultGaugeKPa, type CreateCookRunInput } from '../../../../shared/schemas/cook-runs';
import { kPaToPsi } from '../../../../shared/stats/steam';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { OperatorChoice } from '../../../components/ui/operator-choice';
import { NumberField, TextAreaField, TextField } from '../../../components/ui/form-fields';
import { SuggestedCodeInput } from '../../../components/ui/suggested-code-input';
import { paths } from '../../../config/paths';
import { localInstantOrNull } from '../../../lib/form-values';
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

interface Props {
  open: boolean;
  onClose: () => void;
  me: { id: number; displayName: string };
}

export function CreateCookRunDialog({ open, onClose, me }: Props) {
  const listId = useId();
  const createRun = useCreateCookRun();
  const nextCode = useQuery({ ...cookRunsQueries.nextCode(), enabled: open });
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
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={createRun}
      title="New cook run"
      description="One load through the cooker or autoclave. Minutes at pressure mean little without the container, so both are required."
      submitLabel="Record cook run"
      submitIcon="plus"
      intro={<PressureCaution />}
      schema={createCookRunSchema}
      options={{ defaultValues: defaults }}
      serverFields={fields}
      saved={(run) => `Cook run ${run.code} recorded.`}
      then={(run) => void navigate(paths.cookRun.to(run.id))}
    >
      {(form) => {
        const { register, watch, setValue, formState } = form;
        const gauge = watch('gaugeKPa');
        const byUser = watch('operatorId') === me.id;
        return (
          <>
            <div className="grid gap-4 sm:grid-cols-2">
              <SuggestedCodeInput
                suggestion={nextCode.data?.code}
                edited={Boolean(formState.dirtyFields.code)}
                onSuggestion={(code) => setValue('code', code)}
                error={formState.errors.code?.message}
                {...register('code')}
              />
              <TextField form={form} name="vessel" label="Vessel" optional placeholder="Cooker A" />
              <TextField
                form={form}
                name="cookedOn"
                label="Date"
                type="date"
                hint="Or give the start time."
                setValueAs={(v) => v || null}
              />
              <TextField
                form={form}
                name="startedAt"
                label="Start time"
                type="datetime-local"
                optional
                setValueAs={localInstantOrNull}
              />
              <TextField
                form={form}
                name="container"
                label="Container"
                list={listId}
                hint="1 L jar, 2 L jar, 3 kg bag…"
              />
              <datalist id={listId}>
                <option value="1 L jar" />
                <option value="2 L jar" />
                <option value="3 kg bag" />
              </datalist>
              <NumberField form={form} name="loadCount" label="Load count" optional />
              <NumberField form={form} name="minutesAtPressure" label="Minutes at pressure" />
              <NumberField
                form={form}
                name="gaugeKPa"
                label="Gauge pressure (kPa)"
                step="0.1"
                optional
                hint={
                  typeof gauge === 'number' && !Number.isNaN(gauge)
                    ? `${kPaToPsi(gauge).toFixed(2)} psi`
                    : 'Left empty, 103.4 kPa (15 psi) is assumed.'
                }
              />
              <NumberField
                form={form}
                name="ventingMinutes"
                label="Venting minutes"
                optional
                hint="Steam flowing before the vent was closed."
              />
              <NumberField
                form={form}
                name="altitudeM"
                label="Site altitude (m)"
                hint="Lower air pressure lowers the steam temperature at the same gauge reading."
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
              error={formState.errors.operatorName?.message}
            />
            <TextAreaField form={form} name="notes" label="Notes" optional />
          </>
        );
      }}
    </SaveDialog>
  );
}
