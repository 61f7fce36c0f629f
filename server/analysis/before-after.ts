import type {
  ActionVerdictDto,
  ActionVerdictsDto,
  BeforeAfterDto,
  PeriodCount,
} from '../../shared/schemas/analysis-actions';
import type { ActionVerdictsQuery, BeforeAfterQuery } from '../../shared/schemas/analysis';
import { AppError, notFound, unprocessable } from '../core/errors';
import { todayLocal } from '../core/local-time';
import { analysisRepository } from './analysis.repository';
import type { ActionRow } from './analysis.rows';
import type { CountRow } from './analysis.queries';
import { frameFor, tally } from './frame';
import { compareRates } from './comparison';
import { addDays, daysBetween } from '../core/calendar';

/** A comparison shorter than a week says little; longer than a quarter mixes in other changes. */
export const BEFORE_AFTER_MIN_DAYS = 7;
export const BEFORE_AFTER_MAX_DAYS = 90;

const periodCount = (from: string, to: string, c: CountRow): PeriodCount => ({ from, to, ...tally(c) });

/**
 * DESIGN.md §4.7: equal periods either side of the day the action was done (that day belongs to
 * neither: jars inoculated on it may predate the fix), settled jars only, and the after-period ending
 * no later than today − observation window. By default each period is as long as that allows (7 to 90
 * days); until the after-period has settled the answer says how many days remain and compares nothing.
 */
async function compareAction(action: ActionRow, days?: number, doneOn?: string): Promise<BeforeAfterDto> {
  if (!action.factor || !action.level) {
    throw unprocessable('This corrective action names no factor level to compare.', [
      { path: 'actionId', message: 'the action has no factor and level' },
    ]);
  }
  const pivot = doneOn ?? action.doneOn;
  if (!pivot) {
    throw unprocessable('This corrective action is not done yet, so there is no after-period.', [
      { path: 'actionId', message: 'the action has no done date' },
    ]);
  }
  const today = todayLocal();
  if (pivot > today) {
    throw unprocessable('doneOn: cannot be in the future.', [{ path: 'doneOn', message: 'cannot be in the future' }]);
  }
  const base = await frameFor({}, today);
  const settledUntil = base.windowStart;
  const span =
    days ?? Math.min(BEFORE_AFTER_MAX_DAYS, Math.max(BEFORE_AFTER_MIN_DAYS, daysBetween(pivot, settledUntil)));
  const before = { from: addDays(pivot, -span), to: addDays(pivot, -1) };
  const after = { from: addDays(pivot, 1), to: addDays(pivot, span) };
  const daysRemaining = Math.max(0, daysBetween(settledUntil, after.to));
  const [b, a] = await Promise.all([
    analysisRepository.levelCounts(action.factor, action.level, { ...base, ...before }, true),
    analysisRepository.levelCounts(action.factor, action.level, { ...base, ...after }, true),
  ]);
  const comparison =
    daysRemaining > 0 ? { difference: null, ci95: [null, null] as [null, null], pValue: null } : compareRates(b, a);
  return {
    actionId: action.id,
    factor: action.factor,
    level: action.level,
    pivot,
    days: span,
    settled: daysRemaining === 0,
    daysRemaining: daysRemaining > 0 ? daysRemaining : null,
    before: periodCount(before.from, before.to, b),
    after: periodCount(after.from, after.to, a),
    ...comparison,
  };
}

export async function beforeAfter(q: BeforeAfterQuery): Promise<BeforeAfterDto> {
  const action = await analysisRepository.action(q.actionId);
  if (!action) throw notFound('Corrective action');
  return compareAction(action, q.days, q.doneOn);
}

/** The supervisor's list: every corrective action, newest done first, each with its before/after verdict. */
export async function actionVerdicts(q: ActionVerdictsQuery): Promise<ActionVerdictsDto> {
  const { items, total } = await analysisRepository.actions({ offset: (q.page - 1) * q.pageSize, limit: q.pageSize });
  const rows: ActionVerdictDto[] = [];
  for (const action of items) {
    let comparison: BeforeAfterDto | null = null;
    let unavailable: string | null = null;
    try {
      comparison = await compareAction(action);
    } catch (err) {
      if (!(err instanceof AppError) || err.status !== 422) throw err;
      unavailable = err.message;
    }
    rows.push({ ...action.summary, comparison, unavailable });
  }
  return { items: rows, total, page: q.page, pageSize: q.pageSize };
}
