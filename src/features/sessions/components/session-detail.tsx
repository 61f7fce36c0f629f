import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import { workspaceLabels } from '../../../../shared/schemas/sessions';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { sessionsQueries } from '../api/sessions-queries';
import { FlameCaution } from './flame-caution';
import { SessionChecklist } from './session-checklist';

function Item({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-sm text-muted">{term}</dt>
      <dd className="font-medium">{children}</dd>
    </div>
  );
}

export function SessionDetail({ id, canWrite }: { id: number; canWrite: boolean }) {
  const detail = useQuery(sessionsQueries.detail(id));
  if (detail.isPending) return <FullPageSpinner label="Loading session" />;
  if (detail.error) {
    return (
      <Notice
        tone="danger"
        title="The session could not be loaded."
        action={
          <Button variant="secondary" onClick={() => void detail.refetch()}>
            Try again
          </Button>
        }
      >
        {errorMessage(detail.error)}
      </Notice>
    );
  }
  const s = detail.data;

  return (
    <>
      <p className="no-print mb-2">
        <Link to={paths.sessions.to()} className="text-accent underline-offset-2 hover:underline">
          ← Sessions
        </Link>
      </p>
      <PageHeader title={`Session ${s.code}`} />
      <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <div className="flex flex-col gap-6">
          <section aria-label="Details" className="rounded-lg border border-line bg-surface-raised p-4">
            <dl className="grid gap-4 sm:grid-cols-3">
              <Item term="Date">{formatDate(s.heldOn)}</Item>
              <Item term="Start time">
                {s.startedAt ? new Date(s.startedAt).toLocaleTimeString([], { timeStyle: 'short' }) : '—'}
              </Item>
              <Item term="Operator">{s.operatorName ?? '—'}</Item>
              <Item term="Workspace">{s.workspace ? workspaceLabels[s.workspace] : '—'}</Item>
            </dl>
            {s.notes && <p className="mt-4 whitespace-pre-line">{s.notes}</p>}
          </section>
          <section aria-labelledby="checklist-title" className="rounded-lg border border-line bg-surface-raised p-4">
            <h2 id="checklist-title" className="mb-2 text-lg font-semibold">
              Checklist
            </h2>
            {/* Keyed on the saved state so the boxes reset to what the server holds after a save. */}
            <SessionChecklist key={JSON.stringify(s.checklist)} session={s} canWrite={canWrite} />
          </section>
        </div>
        <aside>
          <FlameCaution />
        </aside>
      </div>
    </>
  );
}
