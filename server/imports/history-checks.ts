import type { EntityManager } from 'typeorm';
import { historyColumns, type ImportError } from '../../shared/schemas/imports';
import { matchKey, type HistoryRow } from './history-rows';
import { cookRunsByCodes } from '../cook-runs/cook-runs.service';
import { culturesByCodes } from '../cultures/cultures.service';
import { listGrains } from '../grain/grain.service';
import { storedJarLabels } from '../jars/history-jars';
import { sessionsByCodes } from '../sessions/sessions.service';
import { accountNames } from '../users/users.service';

export interface Operator {
  userId: number | null;
  /** A user's display name, or the staff name as written. */
  name: string;
}

/** What the file refers to, resolved against the stored records. */
export interface HistoryContext {
  grainIds: Map<string, number>;
  grainList: string;
  usersByKey: Map<string, { id: number; displayName: string }>;
  storedLabels: Set<string>;
  cookRuns: Map<string, { id: number; code: string; minutesAtPressure: number }>;
  sessions: Map<
    string,
    { id: number; code: string; heldOn: string; operatorId: number | null; operatorName: string | null }
  >;
  cultures: Map<string, { id: number; code: string }>;
}

const distinct = (values: string[]) => [...new Map(values.filter(Boolean).map((v) => [matchKey(v), v])).values()];

export async function loadContext(m: EntityManager, rows: HistoryRow[]): Promise<HistoryContext> {
  const grains = await listGrains(m);
  const users = await accountNames(m);
  const usersByKey = new Map<string, { id: number; displayName: string }>();
  // A username wins over someone else's display name that happens to read the same.
  for (const u of users) usersByKey.set(matchKey(u.displayName), u);
  for (const u of users) usersByKey.set(matchKey(u.username), u);
  return {
    grainIds: new Map(grains.map((g) => [matchKey(g.name), g.id])),
    grainList: grains.map((g) => g.name).join(', '),
    usersByKey,
    storedLabels: new Set((await storedJarLabels(m, distinct(rows.map((r) => r.label)))).map(matchKey)),
    ...(await loadCodes(m, rows)),
  };
}

const byKey = <T extends { code: string }>(items: T[]) => new Map(items.map((i) => [matchKey(i.code), i]));

/** The stored cook runs, sessions and cultures the file names, keyed like the collation compares. */
export async function loadCodes(m: EntityManager, rows: HistoryRow[]) {
  return {
    cookRuns: byKey(await cookRunsByCodes(m, distinct(rows.map((r) => r.cookRun)))),
    sessions: byKey(await sessionsByCodes(m, distinct(rows.map((r) => r.session)))),
    cultures: byKey(await culturesByCodes(m, distinct(rows.map((r) => r.culture)))),
  };
}

export function resolveOperator(ctx: HistoryContext, written: string): Operator {
  const user = ctx.usersByKey.get(matchKey(written));
  return user ? { userId: user.id, name: user.displayName } : { userId: null, name: written };
}

const sameOperator = (a: Operator, b: { operatorId: number | null; operatorName: string | null }) =>
  a.userId !== null || b.operatorId !== null
    ? a.userId === b.operatorId
    : matchKey(a.name) === matchKey(b.operatorName ?? '');

/** Rules across rows and against what is stored: unknown grain, repeated labels, codes whose attributes differ. */
export function checkRows(rows: HistoryRow[], ctx: HistoryContext, errors: ImportError[]): void {
  const labels = new Map<string, number>();
  const cookRuns = new Map<string, { minutes: number; line: number }>();
  const sessions = new Map<string, { heldOn: string; operator: Operator; line: number; dateLine: number }>();

  for (const row of rows) {
    const fail = (column: string, message: string) => errors.push({ line: row.line, column, message });

    if (row.grain && !ctx.grainIds.has(matchKey(row.grain))) {
      fail('grain', `"${row.grain}" is not on the lab's grain list (${ctx.grainList})`);
    }

    if (row.label) {
      const key = matchKey(row.label);
      const first = labels.get(key);
      if (first !== undefined) fail('jar_label', `"${row.label}" repeats the label on line ${first}`);
      else {
        labels.set(key, row.line);
        if (ctx.storedLabels.has(key)) fail('jar_label', `"${row.label}" is already stored: jar labels are unique`);
      }
    }

    if (row.cookRun && !Number.isNaN(row.cookMinutes)) {
      const key = matchKey(row.cookRun);
      const stored = ctx.cookRuns.get(key);
      const earlier = cookRuns.get(key);
      if (stored && stored.minutesAtPressure !== row.cookMinutes) {
        fail(
          'cook_minutes',
          `cook run ${stored.code} is stored with ${stored.minutesAtPressure} minutes at pressure, not ${row.cookMinutes}`,
        );
      } else if (earlier && earlier.minutes !== row.cookMinutes) {
        fail(
          'cook_minutes',
          `cook run ${row.cookRun} has ${earlier.minutes} minutes at pressure on line ${earlier.line}, not ${row.cookMinutes}`,
        );
      } else if (!earlier) cookRuns.set(key, { minutes: row.cookMinutes, line: row.line });
    }

    if (row.session) {
      const key = matchKey(row.session);
      const stored = ctx.sessions.get(key);
      const earlier = sessions.get(key);
      const operator = row.operator ? resolveOperator(ctx, row.operator) : null;
      if (row.inoculatedOn) {
        if (stored && stored.heldOn !== row.inoculatedOn) {
          fail(
            'inoculated_on',
            `session ${stored.code} is stored as held on ${stored.heldOn}, not ${row.inoculatedOn}`,
          );
        } else if (earlier?.heldOn && earlier.heldOn !== row.inoculatedOn) {
          fail(
            'inoculated_on',
            `session ${row.session} is held on ${earlier.heldOn} on line ${earlier.dateLine}, not ${row.inoculatedOn}`,
          );
        }
      }
      if (operator) {
        if (stored && !sameOperator(operator, stored)) {
          fail(
            'operator',
            `session ${stored.code} is stored with operator ${stored.operatorName ?? 'unknown'}, not ${row.operator}`,
          );
        } else if (
          earlier &&
          !sameOperator(operator, { operatorId: earlier.operator.userId, operatorName: earlier.operator.name })
        ) {
          fail(
            'operator',
            `session ${row.session} has operator ${earlier.operator.name} on line ${earlier.line}, not ${row.operator}`,
          );
        }
      }
      // A stored session is the reference for every row; otherwise the first row that names it is.
      if (stored) continue;
      if (!earlier && operator) {
        sessions.set(key, { heldOn: row.inoculatedOn, operator, line: row.line, dateLine: row.line });
      } else if (earlier && !earlier.heldOn && row.inoculatedOn) {
        earlier.heldOn = row.inoculatedOn;
        earlier.dateLine = row.line;
      }
    }
  }
}

const columnOrder = new Map<string, number>(['', ...historyColumns].map((c, i) => [c, i]));

export const sortErrors = (errors: ImportError[]) =>
  [...errors].sort((a, b) => a.line - b.line || (columnOrder.get(a.column) ?? 99) - (columnOrder.get(b.column) ?? 99));
