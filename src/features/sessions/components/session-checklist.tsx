import { useState } from 'react';
import type { SessionDetailDto } from '../../../../shared/schemas/sessions';
import { Button } from '../../../components/ui/button';
import { Checkbox } from '../../../components/ui/checkbox';
import { useToast } from '../../../components/ui/toast';
import { errorMessage } from '../../../lib/api-client';
import { useUpdateSession } from '../api/use-update-session';

/** Ticks are saved together, so the audit trail holds one checklist change per save. */
export function SessionChecklist({ session, canWrite }: { session: SessionDetailDto; canWrite: boolean }) {
  const initial = Object.fromEntries(session.checklist.map((r) => [r.stepId, r.done === true]));
  const [ticks, setTicks] = useState<Record<number, boolean>>(initial);
  const update = useUpdateSession(session.id);
  const toast = useToast();
  const changed = session.checklist.some((r) => (ticks[r.stepId] ?? false) !== (r.done === true));

  if (!session.procedure) return <p className="text-muted">No procedure was followed, so there is no checklist.</p>;

  const save = () =>
    update.mutate(
      { checklist: session.checklist.map((r) => ({ stepId: r.stepId, done: ticks[r.stepId] ?? false })) },
      { onSuccess: () => toast.success('Checklist saved.') },
    );

  const done = session.checklist.filter((r) => r.done === true).length;
  return (
    <div className="flex flex-col gap-2">
      <p className="text-muted">
        {session.procedure.title}, version {session.procedure.version}: {done} of {session.checklist.length} steps done.
      </p>
      {session.checklist.map((row) =>
        canWrite ? (
          <Checkbox
            key={row.stepId}
            label={`${row.position}. ${row.text}`}
            hint={row.caution ?? undefined}
            checked={ticks[row.stepId] ?? false}
            onChange={(e) => setTicks((t) => ({ ...t, [row.stepId]: e.target.checked }))}
          />
        ) : (
          <p key={row.stepId}>
            <span aria-hidden="true">{row.done ? '☑' : '☐'}</span>
            <span className="sr-only">{row.done ? 'Done: ' : 'Not done: '}</span> {row.position}. {row.text}
          </p>
        ),
      )}
      {canWrite && (
        <div className="no-print flex flex-wrap items-center gap-3 pt-2">
          <Button onClick={save} pending={update.isPending} disabled={!changed}>
            Save checklist
          </Button>
          <span role="alert" className="text-danger">
            {update.error ? errorMessage(update.error) : null}
          </span>
        </div>
      )}
    </div>
  );
}
