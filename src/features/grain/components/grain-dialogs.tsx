import { useQuery } from '@tanstack/react-query';
import { createGrainLotSchema, createGrainSchema, createPrepBatchSchema } from '../../../../shared/schemas/grain';
import { FormDialog } from '../../../components/ui/form-dialog';
import { controlClasses, Field } from '../../../components/ui/field';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { grainQueries } from '../api/grain-queries';
import { useCreateGrain } from '../api/use-create-grain';
import { useCreateGrainLot } from '../api/use-create-grain-lot';
import { useCreatePrepBatch } from '../api/use-create-prep-batch';
import { todayIso } from '../../../lib/format';

const optionalNumber = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v));
const requiredId = (v: unknown) => (v === '' || v === undefined ? undefined : Number(v));

interface DialogProps {
  open: boolean;
  onClose: () => void;
}

export function AddGrainDialog({ open, onClose }: DialogProps) {
  const create = useCreateGrain();
  const toast = useToast();
  return (
    <FormDialog
      open={open}
      onClose={onClose}
      pending={create.isPending}
      size="sm"
      title="Add a grain to the list"
      submitLabel="Add grain"
      submitIcon="plus"
      schema={createGrainSchema}
      options={{ defaultValues: { name: '' } }}
      serverFields={['name']}
      onSubmit={async (values) => {
        const grain = await create.mutateAsync(values);
        toast.success(`${grain.name} added to the grain list.`);
        onClose();
      }}
    >
      {({ register, formState: { errors } }) => (
        <TextInput
          label="Name"
          hint="Imports match grain names case-insensitively."
          error={errors.name?.message}
          {...register('name')}
        />
      )}
    </FormDialog>
  );
}

export function CreateGrainLotDialog({ open, onClose }: DialogProps) {
  const grains = useQuery({ ...grainQueries.grains(), enabled: open });
  const create = useCreateGrainLot();
  const toast = useToast();
  const options = [
    { value: '', label: 'Choose a grain' },
    ...(grains.data ?? []).filter((g) => g.active).map((g) => ({ value: String(g.id), label: g.name })),
  ];
  return (
    <FormDialog
      open={open}
      onClose={onClose}
      pending={create.isPending}
      title="New grain lot"
      description="A delivery of grain, as the supplier labels it."
      submitLabel="Record lot"
      submitIcon="plus"
      schema={createGrainLotSchema}
      options={{ defaultValues: { supplierLotCode: '', receivedOn: todayIso(), notes: '' } }}
      serverFields={['grainId', 'supplierLotCode', 'receivedOn', 'notes']}
      onSubmit={async (values) => {
        const lot = await create.mutateAsync(values);
        toast.success(`Lot ${lot.supplierLotCode} of ${lot.grain} recorded.`);
        onClose();
      }}
    >
      {({ register, formState: { errors } }) => (
        <>
          <Select
            label="Grain"
            options={options}
            error={errors.grainId?.message}
            {...register('grainId', { setValueAs: requiredId })}
          />
          <TextInput
            label="Supplier lot code"
            error={errors.supplierLotCode?.message}
            {...register('supplierLotCode')}
          />
          <TextInput label="Received on" type="date" error={errors.receivedOn?.message} {...register('receivedOn')} />
          <Field label="Notes" optional error={errors.notes?.message}>
            {(control) => <textarea rows={2} className={controlClasses} {...control} {...register('notes')} />}
          </Field>
        </>
      )}
    </FormDialog>
  );
}

export function CreatePrepBatchDialog({ open, onClose, lotId }: DialogProps & { lotId?: number }) {
  const lots = useQuery({ ...grainQueries.lotOptions(), enabled: open });
  const create = useCreatePrepBatch();
  const toast = useToast();
  const options = [
    { value: '', label: 'Choose a grain lot' },
    ...(lots.data?.items ?? []).map((l) => ({
      value: String(l.id),
      label: `${l.grain} · ${l.supplierLotCode} (received ${l.receivedOn})`,
    })),
  ];
  return (
    <FormDialog
      open={open}
      onClose={onClose}
      pending={create.isPending}
      title="New prep batch"
      description="Grain soaked and simmered together. Wetness varies batch to batch, so jars point at their batch."
      submitLabel="Record batch"
      submitIcon="plus"
      schema={createPrepBatchSchema}
      options={{ defaultValues: { code: '', grainLotId: lotId, preparedOn: todayIso(), notes: '' } }}
      serverFields={['code', 'grainLotId', 'preparedOn', 'soakHours', 'simmerMinutes', 'drainMinutes', 'notes']}
      onSubmit={async (values) => {
        const created = await create.mutateAsync(values);
        toast.success(`Prep batch ${created.code} recorded.`);
        onClose();
      }}
    >
      {({ register, formState: { errors } }) => (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <TextInput label="Code" autoComplete="off" error={errors.code?.message} {...register('code')} />
            <TextInput label="Prepared on" type="date" error={errors.preparedOn?.message} {...register('preparedOn')} />
          </div>
          <Select
            label="Grain lot"
            options={options}
            error={errors.grainLotId?.message}
            {...register('grainLotId', { setValueAs: requiredId })}
          />
          <div className="grid gap-4 sm:grid-cols-3">
            <TextInput
              label="Soak (hours)"
              type="number"
              step="0.5"
              inputMode="decimal"
              optional
              hint="Usually 12–24 h."
              error={errors.soakHours?.message}
              {...register('soakHours', { setValueAs: optionalNumber })}
            />
            <TextInput
              label="Simmer (min)"
              type="number"
              inputMode="numeric"
              optional
              hint="Usually 10–15 min."
              error={errors.simmerMinutes?.message}
              {...register('simmerMinutes', { setValueAs: optionalNumber })}
            />
            <TextInput
              label="Drain / dry (min)"
              type="number"
              inputMode="numeric"
              optional
              error={errors.drainMinutes?.message}
              {...register('drainMinutes', { setValueAs: optionalNumber })}
            />
          </div>
          <Field label="Notes" optional hint="How wet or burst the grain looked." error={errors.notes?.message}>
            {(control) => <textarea rows={2} className={controlClasses} {...control} {...register('notes')} />}
          </Field>
        </>
      )}
    </FormDialog>
  );
}
