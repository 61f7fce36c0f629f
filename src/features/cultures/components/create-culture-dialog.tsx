import { useNavigate } from 'react-router';
import { createCultureSchema, type CreateCultureInput } from '../../../../shared/schemas/cultures';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { NumberField, TextAreaField, TextField } from '../../../components/ui/form-fields';
import { paths } from '../../../config/paths';
import { textOrNull } from '../../../lib/form-values';
import { useCreateCulture } from '../api/use-create-culture';

const fields = [
  'code',
  'species',
  'strain',
  'preparedOn',
  'generation',
  'volumeMl',
  'parentCultureId',
  'notes',
] as const;

interface Props {
  open: boolean;
  onClose: () => void;
  /** Prefills the parent when a child is made from a culture's page. */
  parent?: { id: number; code: string; species: string | null; strain: string | null };
}

export function CreateCultureDialog({ open, onClose, parent }: Props) {
  const createCulture = useCreateCulture();
  const navigate = useNavigate();
  const defaults: CreateCultureInput = {
    code: '',
    species: parent?.species ?? '',
    strain: parent?.strain ?? '',
    parentCultureId: parent?.id ?? null,
  };

  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={createCulture}
      title={parent ? `New culture from ${parent.code}` : 'New culture'}
      description="A new culture starts quarantined. A supervisor releases it once an agar test comes back clean."
      submitLabel="Record culture"
      submitIcon="plus"
      schema={createCultureSchema}
      options={{ defaultValues: defaults }}
      serverFields={fields}
      saved={(culture) => `Culture ${culture.code} recorded, quarantined.`}
      then={(culture) => void navigate(paths.culture.to(culture.id))}
    >
      {(form) => (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField form={form} name="code" label="Code" autoComplete="off" placeholder="LC-…" />
            <TextField form={form} name="preparedOn" label="Prepared on" type="date" optional setValueAs={textOrNull} />
            <TextField form={form} name="species" label="Species" optional setValueAs={textOrNull} />
            <TextField form={form} name="strain" label="Strain label" optional />
            <NumberField
              form={form}
              name="generation"
              label="Generation"
              optional
              hint={parent ? 'Left empty, one more than the parent.' : undefined}
            />
            <NumberField form={form} name="volumeMl" label="Volume (ml)" inputMode="decimal" optional />
          </div>
          {parent ? <p className="text-muted">Parent culture: {parent.code}</p> : null}
          <TextAreaField form={form} name="notes" label="Notes" optional />
        </>
      )}
    </SaveDialog>
  );
}
