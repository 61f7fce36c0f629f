import type { QueueAction, QueueDto } from '../../shared/schemas/queue';
import type { ActionListItemDto } from '../../shared/schemas/corrective-actions';
import { defaultWeeklyPeriod, weeklyTable } from '../analysis/weekly';
import type { SessionUser } from '../core/auth-guards';
import { listCookRuns } from '../cook-runs/cook-runs.service';
import { listActions } from '../incidents/corrective-actions-list.service';
import { listIncidents } from '../incidents/incidents.service';
import { unseenClusterAlerts } from '../mail/cluster-alerts.service';

/** Each list shows this many; its total says how many more wait behind the link. */
export const QUEUE_SHOWN = 8;
const page = { page: 1, pageSize: QUEUE_SHOWN };

const toQueueAction = (a: ActionListItemDto): QueueAction => ({
  id: a.id,
  incidentId: a.incidentId,
  what: a.what,
  ownerName: a.ownerName,
  dueOn: a.dueOn,
});

/** The supervisor's queue: what waits for review or action, oldest or most pressing first. */
export async function supervisorQueue(user: SessionUser): Promise<QueueDto> {
  const period = defaultWeeklyPeriod();
  const [open, inReview, overdue, dueSoon, weekly, runs, [alerts, alertTotal]] = await Promise.all([
    listIncidents({ ...page, status: 'open', voided: 'false', sort: 'foundAt' }),
    listIncidents({ ...page, status: 'in-review', voided: 'false', sort: 'foundAt' }),
    listActions(user, { ...page, state: 'overdue', sort: 'dueOn' }),
    listActions(user, { ...page, state: 'due-soon', sort: 'dueOn' }),
    weeklyTable(period),
    listCookRuns({ ...page, belowTarget: 'true', from: period.from, sort: '-cookedOn' }),
    unseenClusterAlerts(QUEUE_SHOWN),
  ]);
  const toReview = [...open.items, ...inReview.items]
    .sort((a, b) => a.foundAt.localeCompare(b.foundAt) || a.id - b.id)
    .slice(0, QUEUE_SHOWN);
  return {
    incidentsToReview: {
      items: toReview.map((i) => ({
        id: i.id,
        foundOn: i.foundOn,
        contaminant: i.contaminant,
        status: i.status,
        jarCount: i.jarCount,
      })),
      total: open.total + inReview.total,
    },
    actionsOverdue: { items: overdue.items.map(toQueueAction), total: overdue.total },
    actionsDueSoon: { items: dueSoon.items.map(toQueueAction), total: dueSoon.total },
    weeks: weekly.weeks
      .filter((w) => w.outOfControl || w.aboveTarget)
      .map((w) => ({ week: w.week, rate: w.rate, outOfControl: w.outOfControl, aboveTarget: w.aboveTarget })),
    target: weekly.target,
    runsBelowTarget: {
      items: runs.items.map((r) => ({
        id: r.id,
        code: r.code,
        cookedOn: r.cookedOn,
        container: r.container,
        minutesAtPressure: r.minutesAtPressure,
        minimumMinutes: r.minimumMinutes,
        judgedBy: r.judgedBy,
      })),
      total: runs.total,
    },
    clusterAlerts: {
      items: alerts.map((a) => ({
        id: a.id,
        dimension: a.dimension,
        levelId: a.levelId,
        levelCode: a.levelCode,
        incidentCount: a.incidentCount,
        lastFoundOn: a.lastFoundOn,
      })),
      total: alertTotal,
    },
  };
}
