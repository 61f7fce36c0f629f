import { causeCategories, verdicts, type IncidentStatus } from '../../../../shared/enums';
import { reviewIncidentSchema } from '../../../../shared/schemas/incidents';
import type { IncidentDetailDto } from '../../../../shared/schemas/incident-detail';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/form-fields';
import { textOrNull, trimmedOrUndefined } from '../../../lib/form-values';
import { applyServerErrors, Form } from '../../../components/ui/form';
import { useToast } from '../../../components/ui/toast';
import { useReviewIncident } from '../api/use-incident-mutations';
import { causeLabels, statusLabels, verdictLabels } from '../labels';
import { ChoiceTiles } from './choice-tiles';
import { NotesField } from './notes-field';

const moves: Record<IncidentStatus, { to: IncidentStatus; label: string }[]> = {
  open: [{ to: 'in-review', label: 'Start review' }],
  'in-review': [
    { to: 'closed', label: 'Close' },
    { to: 'open', label: 'Back to open' },
  ],
  closed: [{ to: 'in-review', label: 'Reopen' }],
};

const fields = ['status', 'verdict', 'causeCategory', 'rootCauseNotes', 'reason'] as const;

/** Supervisors only (DESIGN.md §2): status, verdict, cause category and notes, each change with an optional reason. */
export function ReviewPanel({ incident }: { incident: IncidentDetailDto }) {
  const review = useReviewIncident(incident.id);
  const toast = useToast();
  const closed = incident.status === 'closed';

  return (
    <Form
      key={incident.version}
      schema={reviewIncidentSchema}
      className="gap-4"
      options={{
        defaultValues: {
          verdict: incident.verdict,
          causeCategory: incident.causeCategory ?? undefined,
          rootCauseNotes: incident.rootCauseNotes ?? '',
          version: incident.version,
        },
      }}
      onSubmit={(values, { setError }) =>
        review.mutateAsync(values).then(
          (next) =>
            toast.success(
              `Incident ${next.id}: ${statusLabels[next.status].toLowerCase()}, ${verdictLabels[next.verdict].toLowerCase()}.`,
            ),
          (error: unknown) => applyServerErrors(error, setError, fields),
        )
      }
    >
      {(form) => {
        const {
          register,
          watch,
          setValue,
          getValues,
          setError,
          formState: { errors, isSubmitting },
        } = form;
        const move = (to: IncidentStatus) => {
          const { reason, version, ...rest } = getValues();
          // A closed incident only reopens; otherwise the move saves together with what is chosen below.
          const input = closed ? { status: to, reason, version } : { ...rest, status: to, reason, version };
          review.mutate(input, {
            onSuccess: (next) =>
              toast.success(`Incident ${next.id} is now ${statusLabels[next.status].toLowerCase()}.`),
            onError: (error) => applyServerErrors(error, setError, fields),
          });
        };
        return (
          <>
            <div className="flex flex-wrap gap-2">
              {moves[incident.status].map((m) => (
                <Button
                  key={m.to}
                  variant={m.to === 'closed' ? 'primary' : 'secondary'}
                  onClick={() => move(m.to)}
                  pending={review.isPending && review.variables.status === m.to}
                >
                  {m.label}
                </Button>
              ))}
            </div>
            {closed ? (
              <p className="text-muted">
                Closed incidents are reopened before their verdict or cause changes; give the reason below.
              </p>
            ) : (
              <>
                <ChoiceTiles
                  legend="Verdict"
                  name="verdict"
                  columns="grid-cols-3"
                  options={verdicts.map((v) => ({ value: v, label: verdictLabels[v] }))}
                  value={watch('verdict')}
                  onChange={(v) => v && setValue('verdict', v)}
                  error={errors.verdict?.message}
                />
                <SelectField
                  form={form}
                  name="causeCategory"
                  label="Cause category"
                  hint="Ishikawa’s six Ms. A lead from the register is a hint, not a diagnosis."
                  optional
                  options={[
                    { value: '', label: 'Not decided' },
                    ...causeCategories.map((c) => ({
                      value: c,
                      label: `${causeLabels[c].label} — ${causeLabels[c].hint}`,
                    })),
                  ]}
                  setValueAs={textOrNull}
                />
                <NotesField
                  label="Root-cause notes"
                  optional
                  error={errors.rootCauseNotes?.message}
                  {...register('rootCauseNotes')}
                />
              </>
            )}
            <TextField
              form={form}
              name="reason"
              label="Reason for the change"
              optional
              setValueAs={trimmedOrUndefined}
            />
            {!closed && (
              <div>
                <Button type="submit" pending={isSubmitting}>
                  Save review
                </Button>
              </div>
            )}
          </>
        );
      }}
    </Form>
  );
}
