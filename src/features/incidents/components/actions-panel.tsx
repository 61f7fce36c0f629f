import { useState, type ReactNode } from 'react';
import { factorNames } from '../../../../shared/enums';
import {
  createActionSchema,
  updateActionSchema,
  type CorrectiveActionDto,
} from '../../../../shared/schemas/corrective-actions';
import { Badge } from '../../../components/ui/badge';
import type { PersonDto } from '../../../../shared/schemas/users';
import { Button } from '../../../components/ui/button';
import { Select } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/form-fields';
import { trimmedOrUndefined } from '../../../lib/form-values';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { useToast } from '../../../components/ui/toast';
import { formatDate, todayIso } from '../../../lib/format';
import { useCreateAction, useUpdateAction } from '../api/use-incident-mutations';
import { NotesField } from './notes-field';

/** What other features show while an action is being closed (its before/after as if done that day). */
export type ClosingExtra = (action: CorrectiveActionDto, doneOn: string) => ReactNode;

function CompleteForm({
  action,
  onDone,
  closing,
}: {
  action: CorrectiveActionDto;
  onDone: () => void;
  closing?: ClosingExtra | undefined;
}) {
  const update = useUpdateAction();
  return (
    <Form
      schema={updateActionSchema}
      className="mt-2 gap-3 rounded-md bg-surface-sunken p-3"
      options={{ defaultValues: { doneOn: todayIso(), verification: '' } }}
      onSubmit={(values, { setError }) =>
        update
          .mutateAsync({ id: action.id, ...values })
          .then(onDone, (error: unknown) => applyServerErrors(error, setError, ['doneOn', 'verification']))
      }
    >
      {(form) => {
        const {
          register,
          watch,
          formState: { errors, isSubmitting },
        } = form;
        return (
          <>
            <TextField form={form} name="doneOn" label="Done on" type="date" />
            {closing?.(action, watch('doneOn') ?? '')}
            <NotesField
              label="How was the fix verified?"
              hint="For example: gauge checked against a reference; next three runs clean."
              error={errors.verification?.message}
              {...register('verification')}
            />
            <div className="flex gap-2">
              <Button type="submit" pending={isSubmitting}>
                Mark done
              </Button>
              <Button variant="secondary" onClick={onDone}>
                Cancel
              </Button>
            </div>
          </>
        );
      }}
    </Form>
  );
}

const STAFF = 'staff';

function AddActionForm({ incidentId, people }: { incidentId: number; people: PersonDto[] }) {
  const create = useCreateAction(incidentId);
  const toast = useToast();
  const [formKey, setFormKey] = useState(0);
  const [ownerChoice, setOwnerChoice] = useState('');
  const ownerOptions = [
    { value: '', label: 'Choose the owner' },
    ...people.map((p) => ({ value: String(p.id), label: p.displayName })),
    { value: STAFF, label: 'Someone without an account…' },
  ];
  return (
    <Form
      key={formKey}
      schema={createActionSchema}
      className="gap-3 no-print"
      onSubmit={(values, { setError }) =>
        create.mutateAsync(values).then(
          () => {
            toast.success('Corrective action added; the owner is told by e-mail where an address is known.');
            setFormKey((k) => k + 1);
            setOwnerChoice('');
          },
          (error: unknown) => applyServerErrors(error, setError, ['what', 'ownerName', 'ownerEmail', 'dueOn']),
        )
      }
    >
      {(form) => {
        const {
          register,
          setValue,
          formState: { errors, isSubmitting },
        } = form;
        return (
          <>
            <NotesField label="What will be done" error={errors.what?.message} {...register('what')} />
            <div className="grid gap-3 sm:grid-cols-2">
              <Select
                label="Owner"
                options={ownerOptions}
                value={ownerChoice}
                error={errors.ownerName?.message ?? errors.ownerId?.message}
                onChange={(e) => {
                  const v = e.target.value;
                  setOwnerChoice(v);
                  setValue('ownerId', v && v !== STAFF ? Number(v) : undefined);
                  if (v !== STAFF) {
                    setValue('ownerName', undefined);
                    setValue('ownerEmail', undefined);
                  }
                }}
              />
              <TextField form={form} name="dueOn" label="Due on" type="date" />
              {ownerChoice === STAFF && (
                <>
                  <TextField form={form} name="ownerName" label="Owner’s name" setValueAs={trimmedOrUndefined} />
                  <TextField
                    form={form}
                    name="ownerEmail"
                    label="Owner’s e-mail"
                    optional
                    type="email"
                    hint="Without one, nobody is told."
                    setValueAs={trimmedOrUndefined}
                  />
                </>
              )}
            </div>
            <div>
              <Button type="submit" variant="secondary" icon="plus" pending={isSubmitting}>
                Add action
              </Button>
            </div>
          </>
        );
      }}
    </Form>
  );
}

export function ActionsPanel({
  incidentId,
  actions,
  canManage,
  extra,
  closing,
  people,
}: {
  incidentId: number;
  actions: CorrectiveActionDto[];
  canManage: boolean;
  /** What other features show on each action (the before/after verdict), composed by the route. */
  extra?: ((action: CorrectiveActionDto) => ReactNode) | undefined;
  closing?: ClosingExtra | undefined;
  people: PersonDto[];
}) {
  const [completing, setCompleting] = useState<number | null>(null);
  return (
    <div className="flex flex-col gap-4">
      {actions.length === 0 && <p className="text-muted">No corrective actions yet.</p>}
      <ul className="flex flex-col gap-3">
        {actions.map((a) => (
          <li key={a.id} id={`action-${a.id}`} className="rounded-md border border-line p-3 print:break-inside-avoid">
            <p className="font-medium">{a.what}</p>
            <p className="text-sm text-muted">
              {a.ownerName} · due {formatDate(a.dueOn)}
              {a.factor && a.level ? ` · ${factorNames[a.factor]} ${a.level}` : ''}
            </p>
            {a.doneOn ? (
              <p className="mt-1 text-sm">
                <Badge tone="ok">Done {formatDate(a.doneOn)}</Badge> Verified: {a.verification}
              </p>
            ) : (
              a.overdue && <Badge tone="danger">Overdue</Badge>
            )}
            {canManage && !a.doneOn && completing !== a.id && (
              <Button variant="ghost" className="no-print mt-1" onClick={() => setCompleting(a.id)}>
                Mark done…
              </Button>
            )}
            {completing === a.id && <CompleteForm action={a} onDone={() => setCompleting(null)} closing={closing} />}
            {a.doneOn && extra?.(a)}
          </li>
        ))}
      </ul>
      {canManage && <AddActionForm incidentId={incidentId} people={people} />}
    </div>
  );
}
