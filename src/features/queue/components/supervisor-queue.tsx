import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router';
import { contaminantNames } from '../../../../shared/enums';
import type { QueueAction, QueueClusterAlert } from '../../../../shared/schemas/queue';
import { Button } from '../../../components/ui/button';
import { LoadFailed } from '../../../components/ui/load-failed';
import { Spinner } from '../../../components/ui/spinner';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import { queueQueries, useMarkAlertSeen } from '../api/queue-queries';
import { QueueItem, QueueSection } from './queue-section';
import { countOf } from '../../../lib/count-text';

const percent = (r: number) => `${(r * 100).toFixed(1)} %`;
const actionTo = (a: QueueAction) => `${paths.incident.to(a.incidentId)}#action-${a.id}`;
const alertFilter: Record<QueueClusterAlert['dimension'], string> = {
  cookRun: 'cookRunId',
  culture: 'cultureId',
  session: 'sessionId',
};
const alertNoun: Record<QueueClusterAlert['dimension'], string> = {
  cookRun: 'cook run',
  culture: 'culture',
  session: 'session',
};

const actionTitles = { overdue: 'Corrective actions overdue', 'due-soon': 'Corrective actions due this week' };

interface ActionsSectionProps {
  id: string;
  /** The state the actions register is filtered to by "See all". */
  state: keyof typeof actionTitles;
  list: { total: number; items: QueueAction[] };
  empty: string;
}

function ActionsSection({ id, state, list, empty }: ActionsSectionProps) {
  return (
    <QueueSection
      id={id}
      title={actionTitles[state]}
      total={list.total}
      allTo={paths.actions.to({ state })}
      empty={empty}
    >
      {list.items.map((a) => (
        <QueueItem key={a.id} to={actionTo(a)} aside={`${a.ownerName} · due ${formatDate(a.dueOn)}`}>
          {a.what}
        </QueueItem>
      ))}
    </QueueSection>
  );
}

/** What waits for the supervisor, each item a link to its record. */
export function SupervisorQueue() {
  const queue = useQuery(queueQueries.detail());
  const seen = useMarkAlertSeen();
  if (queue.isPending) return <Spinner label="Loading your queue" />;
  if (queue.error)
    return (
      <LoadFailed title="Your queue could not be loaded." error={queue.error} onRetry={() => void queue.refetch()} />
    );
  const q = queue.data;
  return (
    <section aria-labelledby="queue-title" className="mb-10">
      <h2 id="queue-title" className="mb-3 text-xl font-semibold">
        Waiting for you
      </h2>
      <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
        <QueueSection
          id="queue-review"
          title="Incidents to review (oldest first)"
          total={q.incidentsToReview.total}
          allTo={paths.incidents.to({ status: 'open', sort: 'foundAt' })}
          empty="Nothing waits for review."
        >
          {q.incidentsToReview.items.map((i) => (
            <QueueItem key={i.id} to={paths.incident.to(i.id)} aside={`found ${formatDate(i.foundOn)} · ${i.status}`}>
              #{i.id} {contaminantNames[i.contaminant]}, {countOf(i.jarCount, 'jar')}
            </QueueItem>
          ))}
        </QueueSection>
        <ActionsSection id="queue-overdue" state="overdue" list={q.actionsOverdue} empty="No action is overdue." />
        <ActionsSection
          id="queue-due"
          state="due-soon"
          list={q.actionsDueSoon}
          empty="None due in the next seven days."
        />
        <QueueSection
          id="queue-weeks"
          title={`Weeks out of control or above ${percent(q.target)}`}
          total={q.weeks.length}
          allTo={paths.analysisWeekly.to()}
          empty="Every settled week is in control and within the lab’s target."
        >
          {q.weeks.map((w) => (
            <QueueItem
              key={w.week}
              to={paths.analysisJars.to({ factor: 'week', level: w.week, only: 'contaminated' })}
              aside={[w.outOfControl && 'out of control', w.aboveTarget && 'above target'].filter(Boolean).join(' · ')}
            >
              {w.week}: {percent(w.rate)}
            </QueueItem>
          ))}
        </QueueSection>
        <QueueSection
          id="queue-runs"
          title="Cook runs below their cook target"
          total={q.runsBelowTarget.total}
          allTo={paths.cookRuns.to({ belowTarget: 'true' })}
          empty="No recent run fell below its target."
        >
          {q.runsBelowTarget.items.map((r) => (
            <QueueItem
              key={r.id}
              to={paths.cookRun.to(r.id)}
              aside={
                r.judgedBy === 'minutes'
                  ? `${r.minutesAtPressure} of ${r.minimumMinutes} min for a ${r.container}`
                  : 'F0 below target'
              }
            >
              {r.code}
              {r.cookedOn ? `, ${formatDate(r.cookedOn)}` : ''}
            </QueueItem>
          ))}
        </QueueSection>
        <QueueSection
          id="queue-alerts"
          title="Cluster alerts not yet looked at"
          total={q.clusterAlerts.total}
          empty="No alert waits."
        >
          {q.clusterAlerts.items.map((a) => (
            <li key={a.id} className="flex flex-wrap items-center justify-between gap-2">
              <Link
                to={paths.incidents.to({ [alertFilter[a.dimension]]: a.levelId })}
                className="font-medium text-accent underline"
              >
                {a.incidentCount} incidents on {alertNoun[a.dimension]} {a.levelCode}
              </Link>
              <Button
                variant="ghost"
                pending={seen.isPending && seen.variables === a.id}
                onClick={() => seen.mutate(a.id)}
              >
                Mark looked at
              </Button>
            </li>
          ))}
        </QueueSection>
      </div>
    </section>
  );
}
