import { useNavigate } from 'react-router';
import { createCultureSchema, type CreateCultureInput } from '../../../../shared/schemas/cultures';
import { FormDialog } from '../../../components/ui/form-dialog';
import { controlClasses, Field } from '../../../components/ui/field';
import { TextInput } from '../../../components/ui/text-input';
import { useToast } from '../../../components/ui/toast';
import { paths } from '../../../config/paths';
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
const optionalNumber = (v: unknown) => (v === '' || v === null || v === undefined ? null : Number(v));
const optionalText = (v: unknown) => (v === '' ? null : v);

interface Props {
  open: boolean;
  onClose: () => void;
  /** Prefills the parent when a child is made from a culture's page. */
  parent?: { id: number; code: string; species: string | null; strain: string | null };
}

export function CreateCultureDialog({ open, onClose, parent }: Props) {
  const createCulture = useCreateCulture();
  const toast = useToast();
  const navigate = useNavigate();
  const defaults: CreateCultureInput = {
    code: '',
    species: parent?.species ?? '',
    strain: parent?.strain ?? '',
    parentCultureId: parent?.id ?? null,
  };

  return (
    <FormDialog
      open={open}
      onClose={onClose}
      pending={createCulture.isPending}
      title={parent ? `New culture from ${parent.code}` : 'New culture'}
      description="A new culture starts quarantined. A supervisor releases it once an agar test comes back clean."
      submitLabel="Record culture"
      submitIcon="plus"
      schema={createCultureSchema}
      options={{ defaultValues: defaults }}
      serverFields={fields}
      onSubmit={async (values) => {
        const culture = await createCulture.mutateAsync(values);
        toast.success(`Culture ${culture.code} recorded, quarantined.`);
        onClose();
        void navigate(paths.culture.to(culture.id));
      }}
    >
      {({ register, formState: { errors } }) => (
        <>
          <div className="grid gap-4 sm:grid-cols-2">
            <TextInput
              label="Code"
              autoComplete="off"
              placeholder="LC-…"
              error={errors.code?.message}
              {...register('code')}
            />
            <TextInput
              label="Prepared on"
              type="date"
              optional
              error={errors.preparedOn?.message}
              {...register('preparedOn', { setValueAs: optionalText })}
            />
            <TextInput
              label="Species"
              optional
              error={errors.species?.message}
              {...register('species', { setValueAs: optionalText })}
            />
            <TextInput label="Strain label" optional error={errors.strain?.message} {...register('strain')} />
            <TextInput
              label="Generation"
              type="number"
              inputMode="numeric"
              optional
              hint={parent ? 'Left empty, one more than the parent.' : undefined}
              error={errors.generation?.message}
              {...register('generation', { setValueAs: optionalNumber })}
            />
            <TextInput
              label="Volume (ml)"
              type="number"
              inputMode="decimal"
              optional
              error={errors.volumeMl?.message}
              {...register('volumeMl', { setValueAs: optionalNumber })}
            />
          </div>
          {parent ? <p className="text-muted">Parent culture: {parent.code}</p> : null}
          <Field label="Notes" optional error={errors.notes?.message}>
            {(control) => <textarea rows={3} className={controlClasses} {...control} {...register('notes')} />}
          </Field>
        </>
      )}
    </FormDialog>
  );
}
