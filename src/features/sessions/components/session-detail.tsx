import { useQuery } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { workspaceLabels } from '../../../../shared/schemas/sessions';
import { Fact, Facts } from '../../../components/ui/facts';
import { LoadFailed } from '../../../components/ui/load-failed';
import { BackLink } from '../../../components/ui/text-link';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { sessionsQueries } from '../api/sessions-queries';
import { FlameCaution } from './flame-caution';
import { SessionChecklist } from './session-checklist';

interface Props {
  id: number;
  canWrite: boolean;
  /** The session's jars, which another feature lists. */
  jars?: ReactNode;
}

export function SessionDetail({ id, canWrite, jars }: Props) {
  const detail = useQuery(sessionsQueries.detail(id));
  if (detail.isPending) return <FullPageSpinner label="Loading session" />;
  if (detail.error) {
    return (
      <LoadFailed title="The session could not be loaded." error={detail.error} onRetry={() => void detail.refetch()} />
    );
  }
  const s = detail.data;

  return (
    <>
      <BackLink to={paths.sessions.to()}>Sessions</BackLink>
      <PageHeader title={`Session ${s.code}`} />
      <div className="grid gap-6 lg:grid-cols-[2fr_1fr]">
        <div className="flex flex-col gap-6">
          <section aria-label="Details" className="rounded-lg border border-line bg-surface-raised p-4">
            <Facts>
              <Fact term="Date">{formatDate(s.heldOn)}</Fact>
              <Fact term="Start time">
                {s.startedAt ? new Date(s.startedAt).toLocaleTimeString([], { timeStyle: 'short' }) : '—'}
              </Fact>
              <Fact term="Operator">{s.operatorName ?? '—'}</Fact>
              <Fact term="Workspace">{s.workspace ? workspaceLabels[s.workspace] : '—'}</Fact>
            </Facts>
            {s.notes && <p className="mt-4 whitespace-pre-line">{s.notes}</p>}
          </section>
          <section aria-labelledby="checklist-title" className="rounded-lg border border-line bg-surface-raised p-4">
            <h2 id="checklist-title" className="mb-2 text-lg font-semibold">
              Checklist
            </h2>
            {/* Keyed on the saved state so the boxes reset to what the server holds after a save. */}
            <SessionChecklist key={JSON.stringify(s.checklist)} session={s} canWrite={canWrite} />
          </section>
          {jars}
        </div>
        <aside>
          <FlameCaution />
        </aside>
      </div>
    </>
  );
}
