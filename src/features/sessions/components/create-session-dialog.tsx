import { useQuery } from '@tanstack/react-query';
import { useEffect } from 'react';
import { useNavigate } from 'react-router';
import { workspaces } from '../../../../shared/enums';
import { createSessionSchema, workspaceLabels, type CreateSessionInput } from '../../../../shared/schemas/sessions';
import { Checkbox } from '../../../components/ui/checkbox';
import { SaveDialog } from '../../../components/ui/form-dialog';
import { OperatorChoice } from '../../../components/ui/operator-choice';
import type { FormMethods } from '../../../components/ui/form';
import { SelectField, TextAreaField, TextField } from '../../../components/ui/form-fields';
import { SuggestedCodeInput } from '../../../components/ui/suggested-code-input';
import { paths } from '../../../config/paths';
import { sessionsQueries } from '../api/sessions-queries';
import { useCreateSession } from '../api/use-create-session';
import { FlameCaution } from './flame-caution';
import { todayIso } from '../../../lib/format';
import { localInstantOrNull, numberOrNull } from '../../../lib/form-values';

const fields = [
  'code',
  'heldOn',
  'startedAt',
  'operatorId',
  'operatorName',
  'workspace',
  'procedureVersionId',
  'checklist',
  'notes',
] as const;
const workspaceOptions = workspaces.map((w) => ({ value: w, label: workspaceLabels[w] }));

type Methods = FormMethods<typeof createSessionSchema>;

/** The steps of the chosen version, each a tick box; the version's steps arrive from the server. */
function ChecklistFields({ versionId, methods }: { versionId: number; methods: Methods }) {
  const version = useQuery(sessionsQueries.procedureVersion(versionId));
  const { setValue, register } = methods;
  const steps = version.data?.steps;
  useEffect(() => {
    if (steps)
      setValue(
        'checklist',
        steps.map((s) => ({ stepId: s.id, done: false })),
      );
  }, [steps, setValue]);

  if (version.isPending) return <p className="text-muted">Loading the steps…</p>;
  if (!steps) return <p className="text-danger">The steps of this procedure could not be loaded.</p>;
  return (
    <fieldset className="flex flex-col gap-1">
      <legend className="mb-1 font-medium">Checklist — steps done</legend>
      {steps.map((step, i) => (
        <Checkbox
          key={step.id}
          label={`${step.position}. ${step.text}`}
          hint={step.caution ?? undefined}
          {...register(`checklist.${i}.done`)}
        />
      ))}
    </fieldset>
  );
}

interface Props {
  open: boolean;
  onClose: () => void;
  me: { id: number; displayName: string };
}

export function CreateSessionDialog({ open, onClose, me }: Props) {
  const createSession = useCreateSession();
  const nextCode = useQuery({ ...sessionsQueries.nextCode(), enabled: open });
  const procedures = useQuery({ ...sessionsQueries.procedureOptions(), enabled: open });
  const navigate = useNavigate();
  const procedureOptions = [
    { value: '', label: 'None' },
    ...(procedures.data?.items ?? [])
      .filter((p) => p.currentVersionId !== null)
      .map((p) => ({ value: String(p.currentVersionId), label: `${p.title} (v${p.currentVersion})` })),
  ];
  const defaults: CreateSessionInput = {
    code: '',
    heldOn: todayIso(),
    operatorId: me.id,
    workspace: 'flow-hood',
    procedureVersionId: null,
    checklist: [],
    notes: '',
  };

  return (
    <SaveDialog
      open={open}
      onClose={onClose}
      mutation={createSession}
      title="New inoculation session"
      submitLabel="Record session"
      submitIcon="plus"
      intro={<FlameCaution />}
      schema={createSessionSchema}
      options={{ defaultValues: defaults }}
      serverFields={fields}
      saved={(session) => `Session ${session.code} recorded.`}
      then={(session) => void navigate(paths.session.to(session.id))}
    >
      {(form) => {
        const {
          register,
          watch,
          setValue,
          formState: { errors, dirtyFields },
        } = form;
        const byUser = watch('operatorId') === me.id;
        const versionId = watch('procedureVersionId');
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
              <TextField form={form} name="heldOn" label="Date" type="date" />
              <TextField
                form={form}
                name="startedAt"
                label="Start time"
                type="datetime-local"
                optional
                setValueAs={localInstantOrNull}
              />
              <SelectField form={form} name="workspace" label="Workspace" options={workspaceOptions} />
            </div>
            <OperatorChoice
              selfLabel="I inoculated"
              selfName={me.displayName}
              bySelf={byUser}
              onChooseSelf={() => {
                setValue('operatorId', me.id);
                setValue('operatorName', undefined);
              }}
              onChooseOther={() => setValue('operatorId', undefined)}
              staffName={register('operatorName')}
              error={errors.operatorName?.message ?? errors.operatorId?.message}
            />
            <SelectField
              form={form}
              name="procedureVersionId"
              label="Procedure followed"
              optional
              options={procedureOptions}
              hint={
                procedures.isError
                  ? 'The procedure list could not be loaded.'
                  : 'Its current version; the checklist follows its steps.'
              }
              setValueAs={numberOrNull}
              onValueChange={() => setValue('checklist', [])}
            />
            {typeof versionId === 'number' && <ChecklistFields key={versionId} versionId={versionId} methods={form} />}
            {errors.checklist?.message && <p className="text-sm font-medium text-danger">{errors.checklist.message}</p>}
            <TextAreaField form={form} name="notes" label="Notes" optional />
          </>
        );
      }}
    </SaveDialog>
  );
}
