import { useQuery } from '@tanstack/react-query';
import { createGrainLotSchema, createGrainSchema, createPrepBatchSchema } from '../../../../shared/schemas/grain';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { NumberField, SelectField, TextAreaField, TextField } from '../../../components/ui/form-fields';
import { grainQueries } from '../api/grain-queries';
import { useCreateGrain } from '../api/use-create-grain';
import { useCreateGrainLot } from '../api/use-create-grain-lot';
import { useCreatePrepBatch } from '../api/use-create-prep-batch';
import { todayIso } from '../../../lib/format';
import { numberOrUndefined } from '../../../lib/form-values';

interface DialogProps {
  open: boolean;
  onClose: () => void;
}

export function AddGrainDialog({ open, onClose }: DialogProps) {
  const create = useCreateGrain();
  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={create}
      size="sm"
      title="Add a grain to the list"
      submitLabel="Add grain"
      submitIcon="plus"
      schema={createGrainSchema}
      options={{ defaultValues: { name: '' } }}
      serverFields={['name']}
      saved={(grain) => `${grain.name} added to the grain list.`}
    >
      {(form) => (
        <TextField form={form} name="name" label="Name" hint="Imports match grain names case-insensitively." />
      )}
    </SaveDialog>
  );
}

export function CreateGrainLotDialog({ open, onClose }: DialogProps) {
  const grains = useQuery({ ...grainQueries.grains(), enabled: open });
  const create = useCreateGrainLot();
  const options = [
    { value: '', label: 'Choose a grain' },
    ...(grains.data ?? []).filter((g) => g.active).map((g) => ({ value: String(g.id), label: g.name })),
  ];
  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={create}
      title="New grain lot"
      description="A delivery of grain, as the supplier labels it."
      submitLabel="Record lot"
      submitIcon="plus"
      schema={createGrainLotSchema}
      options={{ defaultValues: { supplierLotCode: '', receivedOn: todayIso(), notes: '' } }}
      serverFields={['grainId', 'supplierLotCode', 'receivedOn', 'notes']}
      saved={(lot) => `Lot ${lot.supplierLotCode} of ${lot.grain} recorded.`}
    >
      {(form) => (
        <>
          <SelectField form={form} name="grainId" label="Grain" options={options} setValueAs={numberOrUndefined} />
          <TextField form={form} name="supplierLotCode" label="Supplier lot code" />
          <TextField form={form} name="receivedOn" label="Received on" type="date" />
          <TextAreaField form={form} name="notes" label="Notes" optional rows={2} />
        </>
      )}
    </SaveDialog>
  );
}

export function CreatePrepBatchDialog({ open, onClose, lotId }: DialogProps & { lotId?: number }) {
  const lots = useQuery({ ...grainQueries.lotOptions(), enabled: open });
  const create = useCreatePrepBatch();
  const options = [
    { value: '', label: 'Choose a grain lot' },
    ...(lots.data?.items ?? []).map((l) => ({
      value: String(l.id),
      label: `${l.grain} · ${l.supplierLotCode} (received ${l.receivedOn})`,
    })),
  ];
  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={create}
      title="New prep batch"
      description="Grain soaked and simmered together. Wetness varies batch to batch, so jars point at their batch."
      submitLabel="Record batch"
      submitIcon="plus"
      schema={createPrepBatchSchema}
      options={{ defaultValues: { code: '', grainLotId: lotId, preparedOn: todayIso(), notes: '' } }}
      serverFields={['code', 'grainLotId', 'preparedOn', 'soakHours', 'simmerMinutes', 'drainMinutes', 'notes']}
      saved={(created) => `Prep batch ${created.code} recorded.`}
    >
      {(form) => (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField form={form} name="code" label="Code" autoComplete="off" />
            <TextField form={form} name="preparedOn" label="Prepared on" type="date" />
          </div>
          <SelectField
            form={form}
            name="grainLotId"
            label="Grain lot"
            options={options}
            setValueAs={numberOrUndefined}
          />
          <div className="grid gap-4 sm:grid-cols-3">
            <NumberField
              form={form}
              name="soakHours"
              label="Soak (hours)"
              step="0.5"
              optional
              hint="Usually 12–24 h."
            />
            <NumberField form={form} name="simmerMinutes" label="Simmer (min)" optional hint="Usually 10–15 min." />
            <NumberField form={form} name="drainMinutes" label="Drain / dry (min)" optional />
          </div>
          <TextAreaField
            form={form}
            name="notes"
            label="Notes"
            optional
            hint="How wet or burst the grain looked."
            rows={2}
          />
        </>
      )}
    </SaveDialog>
  );
}
