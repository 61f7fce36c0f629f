import { useQuery } from '@tanstack/react-query';
import { useState, type ReactNode } from 'react';
import { contaminantNames, type Role } from '../../../../shared/enums';
import type { CorrectiveActionDto } from '../../../../shared/schemas/corrective-actions';
import type { IncidentDetailDto } from '../../../../shared/schemas/incident-detail';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Fact, Facts } from '../../../components/ui/facts';
import { LoadFailed } from '../../../components/ui/load-failed';
import { BackLink } from '../../../components/ui/text-link';
import { PageHeader } from '../../../components/ui/page-header';
import { FullPageSpinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { incidentsQueries } from '../api/incidents-queries';
import { causeLabels, severityLabels, stageLabels } from '../labels';
import type { PersonDto } from '../../../../shared/schemas/users';
import { ActionsPanel, type ClosingExtra } from './actions-panel';
import { AddPhotos } from './add-photos';
import { EditIncidentDialog } from './edit-incident-dialog';
import { HistoryList } from './history-list';
import { IncidentBadges } from './incident-badges';
import { IncidentJars } from './incident-jars';
import { IncidentPhotos } from './incident-photos';
import { ReviewPanel } from './review-panel';
import { SporeCautions } from './spore-cautions';
import { VoidDialog } from './void-dialog';
import { formatDateTime } from '../../../lib/format';

function Section({ title, children, className }: { title: string; children: ReactNode; className?: string }) {
  return (
    <section
      aria-label={title}
      className={`rounded-lg border border-line bg-surface-raised p-4 print:border-0 print:p-0 ${className ?? ''}`}
    >
      <h2 className="mb-3 text-lg font-semibold">{title}</h2>
      {children}
    </section>
  );
}

const yesNo = (b: boolean) => (b ? 'Yes' : 'No');

/** The finder may edit and add to their own open incident; a supervisor any that is not voided (as the server checks). */
const canAddTo = (i: IncidentDetailDto, me: { id: number; role: Role }) =>
  !i.voided &&
  (me.role === 'supervisor' ||
    ((me.role === 'technician' || me.role === 'admin') && i.status === 'open' && i.foundById === me.id));

export function IncidentDetail({
  id,
  me,
  actionExtra,
  actionClosing,
  people = [],
}: {
  id: number;
  me: { id: number; role: Role };
  actionExtra?: (action: CorrectiveActionDto) => ReactNode;
  /** Shown in the form that closes an action, for the day being entered. */
  actionClosing?: ClosingExtra;
  /** Who may own a corrective action. */
  people?: PersonDto[];
}) {
  const detail = useQuery(incidentsQueries.detail(id));
  const [voiding, setVoiding] = useState(false);
  const [editing, setEditing] = useState(false);
  if (detail.isPending) return <FullPageSpinner label="Loading incident" />;
  if (detail.error) {
    return (
      <LoadFailed
        title="The incident could not be loaded."
        error={detail.error}
        onRetry={() => void detail.refetch()}
      />
    );
  }
  const i = detail.data;
  const supervisor = me.role === 'supervisor';

  return (
    <>
      <BackLink to={paths.incidents.to()}>Incidents</BackLink>
      <PageHeader
        title={`Incident ${i.id}`}
        description={<IncidentBadges status={i.status} verdict={i.verdict} voided={i.voided} />}
        actions={
          <>
            <Button variant="secondary" onClick={() => window.print()}>
              Print incident sheet
            </Button>
            {canAddTo(i, me) && (
              <Button variant="secondary" onClick={() => setEditing(true)}>
                Edit details
              </Button>
            )}
            {supervisor && !i.voided && (
              <Button variant="danger" onClick={() => setVoiding(true)}>
                Void…
              </Button>
            )}
          </>
        }
      />
      {i.voided && (
        <Notice tone="warn" title="Voided" className="mb-4">
          {i.voidReason}. Its jars no longer count as contaminated.
        </Notice>
      )}
      <div className="grid gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] print:block">
        <div className="flex flex-col gap-6 print:gap-4">
          <Section title="What was found">
            <Facts className="grid-cols-2">
              <Fact term="Contaminant">{contaminantNames[i.contaminant]}</Fact>
              <Fact term="Severity">{severityLabels[i.severity]}</Fact>
              <Fact term="Stage">{stageLabels[i.stage]}</Fact>
              <Fact term="Found">{formatDateTime(i.foundAt)}</Fact>
              <Fact term="Found by">{i.foundByName}</Fact>
              <Fact term="Signs">{[i.signColour, i.signSmell, i.signTexture].filter(Boolean).join(', ') || '—'}</Fact>
              <Fact term="Sealed">{yesNo(i.sealed)}</Fact>
              <Fact term="Sterilised before disposal">{yesNo(i.sterilisedBeforeDisposal)}</Fact>
              <Fact term="Cause category">{i.causeCategory ? causeLabels[i.causeCategory].label : '—'}</Fact>
            </Facts>
            {i.notes && <p className="mt-3 whitespace-pre-line">{i.notes}</p>}
            {i.rootCauseNotes && (
              <p className="mt-3 whitespace-pre-line">
                <span className="font-medium">Root cause: </span>
                {i.rootCauseNotes}
              </p>
            )}
          </Section>
          <Section title={i.jars.length === 1 ? 'Jar' : `Jars (${i.jars.length})`}>
            <IncidentJars jars={i.jars} />
          </Section>
          <Section title="Photos">
            <IncidentPhotos photos={i.photos} />
            {canAddTo(i, me) && <AddPhotos incidentId={i.id} />}
          </Section>
          {i.stepLinks.length > 0 && (
            <Section title="Procedure steps likely missed">
              <ul className="flex flex-col gap-2">
                {i.stepLinks.map((l) => (
                  <li key={l.id}>
                    <span className="font-medium">
                      {l.procedureTitle ?? 'Procedure'} v{l.procedureVersion ?? '?'}, step {l.position ?? '?'}:
                    </span>{' '}
                    {l.stepText}
                    <span className="block text-sm text-muted">
                      {l.linkedByName}
                      {l.note ? ` — ${l.note}` : ''}
                    </span>
                  </li>
                ))}
              </ul>
            </Section>
          )}
          <Section title="Corrective actions">
            <ActionsPanel
              incidentId={i.id}
              actions={i.actions}
              canManage={supervisor && !i.voided}
              extra={actionExtra}
              closing={actionClosing}
              people={people}
            />
          </Section>
        </div>
        <div className="flex flex-col gap-6 print:mt-4">
          {supervisor && !i.voided && (
            <Section title="Review" className="no-print">
              <ReviewPanel incident={i} />
            </Section>
          )}
          <SporeCautions />
          <Section title="History">
            <HistoryList entries={i.history} context={{ photoIds: i.photos.map((p) => p.id), actions: i.actions }} />
          </Section>
        </div>
      </div>
      {canAddTo(i, me) && <EditIncidentDialog incident={i} open={editing} onClose={() => setEditing(false)} />}
      {supervisor && (
        <VoidDialog incidentId={i.id} version={i.version} open={voiding} onClose={() => setVoiding(false)} />
      )}
    </>
  );
}
