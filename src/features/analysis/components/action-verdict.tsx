import { useQuery } from '@tanstack/react-query';
import type { BeforeAfterDto } from '../../../../shared/schemas/analysis-actions';
import { factorNames } from '../../../../shared/enums';
import { ApiError } from '../../../lib/api-client';
import { formatDate } from '../../../lib/format';
import { analysisQueries } from '../api/analysis-queries';
import { percent } from './labels';

/** After minus before in percentage points, with its interval: "−12.0 points (−20.1 to −3.5)". */
const points = (v: number | null) =>
  v === null ? '—' : `${v > 0 ? '+' : v < 0 ? '−' : ''}${Math.abs(v * 100).toFixed(1)}`;

/** What the comparison says, in words a supervisor can act on. */
export function verdictWords(d: BeforeAfterDto): string {
  if (!d.settled) return `Not settled yet: the after-period’s jars are still at risk for ${d.daysRemaining} more days.`;
  if (d.difference === null) return 'No settled jars on one side: nothing to compare.';
  const [lo, hi] = d.ci95;
  if (hi !== null && hi < 0) return 'Fewer jars lost after the action, beyond what chance explains.';
  if (lo !== null && lo > 0) return 'More jars lost after the action: it has not worked.';
  return 'No clear change yet: the interval spans zero.';
}

export function BeforeAfterFigures({ d }: { d: BeforeAfterDto }) {
  return (
    <div className="text-sm" data-testid="before-after">
      <p>
        Before ({d.days} days): {d.before.contaminated} of {d.before.jars} settled jars, {percent(d.before.rate)} ·
        After: {d.after.contaminated} of {d.after.jars}, {percent(d.after.rate)}
      </p>
      {d.settled && d.difference !== null && (
        <p>
          Difference {points(d.difference)} points (95 % {points(d.ci95[0])} to {points(d.ci95[1])}, Newcombe method 10)
        </p>
      )}
      <p className="font-medium">{verdictWords(d)}</p>
    </div>
  );
}

/**
 * The before/after verdict of one corrective action, shown where the action is recorded; with `doneOn`,
 * a preview while it is being closed, as if done that day.
 */
export function ActionVerdict({ actionId, doneOn }: { actionId: number; doneOn?: string }) {
  const preview = doneOn !== undefined;
  const q = useQuery({
    ...analysisQueries.beforeAfter(actionId, doneOn),
    enabled: !preview || /^\d{4}-\d{2}-\d{2}$/.test(doneOn),
  });
  if (preview && !/^\d{4}-\d{2}-\d{2}$/.test(doneOn)) {
    return <p className="text-sm text-muted">Give the day it was done to see before and after.</p>;
  }
  if (q.isPending) return <p className="mt-2 text-sm text-muted">Working out before and after…</p>;
  if (q.error) {
    const why =
      q.error instanceof ApiError && q.error.status === 422
        ? q.error.message
        : 'Before and after could not be worked out.';
    return <p className="mt-2 text-sm text-muted">{why}</p>;
  }
  return (
    <div className="mt-2 rounded bg-surface-sunken p-2" aria-live="polite">
      <p className="text-sm font-semibold">
        Before and after{preview ? ` if done on ${formatDate(doneOn)}` : ''}: {factorNames[q.data.factor]}{' '}
        {q.data.level}
      </p>
      <BeforeAfterFigures d={q.data} />
    </div>
  );
}
