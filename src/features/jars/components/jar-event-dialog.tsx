import type { FieldErrors } from 'react-hook-form';
import {
  jarEventInputSchema,
  type JarEventFields,
  type JarEventInputType,
} from '../../../../shared/schemas/jar-events';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { controlClasses, Field } from '../../../components/ui/field';
import { Select } from '../../../components/ui/select';
import { TextInput } from '../../../components/ui/text-input';
import { useRecordJarEvent } from '../api/use-record-jar-event';
import { DiscardCaution } from './discard-caution';
import { eventActions } from './jar-event-actions';

const fields = ['percentColonised', 'room', 'shelf', 'releasedTo', 'releasedToWho', 'reason', 'note', 'at'] as const;
const releaseOptions = [
  { value: 'grow-room', label: 'The grow room' },
  { value: 'customer', label: 'A customer' },
];

interface Props {
  jar: { id: number; label: string; room: string | null; shelf: string | null };
  type: JarEventInputType | null;
  onClose: () => void;
}

export function JarEventDialog({ jar, type, onClose }: Props) {
  const record = useRecordJarEvent(jar.id);
  if (!type) return null;
  const action = eventActions[type];
  const defaults = {
    type,
    room: jar.room ?? '',
    shelf: jar.shelf ?? '',
    releasedTo: 'grow-room',
  } as unknown as JarEventFields;

  return (
    <SaveDialog
      open
      onClose={onClose}
      mutation={record}
      title={`${action.title} — ${jar.label}`}
      submitLabel={action.label}
      submitVariant={type === 'discarded' ? 'danger' : 'primary'}
      schema={jarEventInputSchema}
      options={{ defaultValues: defaults }}
      serverFields={fields}
      saved={() => action.done}
    >
      {({ register, formState }) => {
        const errors = formState.errors as FieldErrors<Record<(typeof fields)[number], string>>;
        return (
          <>
            <input type="hidden" {...register('type')} />
            {type === 'discarded' && <DiscardCaution />}
            {type === 'check' && (
              <TextInput
                label="Colonised (%)"
                type="number"
                inputMode="numeric"
                min={0}
                max={100}
                error={errors.percentColonised?.message}
                {...register('percentColonised', { setValueAs: (v: string) => (v === '' ? undefined : Number(v)) })}
              />
            )}
            {type === 'moved' && (
              <div className="grid gap-4 sm:grid-cols-2">
                <TextInput label="Room" error={errors.room?.message} {...register('room')} />
                <TextInput label="Shelf" error={errors.shelf?.message} {...register('shelf')} />
              </div>
            )}
            {type === 'released' && (
              <>
                <Select
                  label="Released to"
                  options={releaseOptions}
                  error={errors.releasedTo?.message}
                  {...register('releasedTo')}
                />
                <TextInput
                  label="Who received it"
                  hint="Needed for a customer, so the jar can be recalled."
                  error={errors.releasedToWho?.message}
                  {...register('releasedToWho')}
                />
              </>
            )}
            {(type === 'hold' || type === 'discarded' || type === 'resume') && (
              <TextInput label="Reason" error={errors.reason?.message} {...register('reason')} />
            )}
            <Field label="Note" optional error={errors.note?.message}>
              {(control) => <textarea rows={2} className={controlClasses} {...control} {...register('note')} />}
            </Field>
          </>
        );
      }}
    </SaveDialog>
  );
}
