import { randomUUID } from 'node:crypto';
import { QueryFailedError, type EntityManager } from 'typeorm';
import type { ImportError, ImportRejection, ImportResult } from '../../shared/schemas/imports';
import { recordAudit, type Actor } from '../audit/audit.service';
import { config } from '../core/config';
import { AppError, badRequest } from '../core/errors';
import { localDate } from '../core/local-time';
import { dataSource } from '../db/data-source';
import { insertCookRuns } from '../cook-runs/cook-runs.service';
import { insertCultures } from '../cultures/cultures.service';
import { insertHistoryIncidents, type HistoryIncident } from '../incidents/history-incidents';
import { insertHistoryJars, type HistoryJar } from '../jars/history-jars';
import { recountJars } from '../tallies/tallies.service';
import { insertSessions } from '../sessions/sessions.service';
import { getLabSettings } from '../settings/settings.service';
import { staffForNames } from '../staff/staff.service';
import { checkRows, loadCodes, loadContext, resolveOperator, sortErrors, type HistoryContext } from './history-checks';
import { parseHistoryCsv } from './history-csv';
import { isBlankRecord, mapHeader, matchKey, readRow, type HistoryRow } from './history-rows';
import { daysBetween, labNoon } from './lab-noon';

export type HistoryImportOutcome = { ok: true; result: ImportResult } | { ok: false; errors: ImportError[] };

const isDuplicateKey = (err: unknown) =>
  err instanceof QueryFailedError && (err.driverError as { code?: string }).code === 'ER_DUP_ENTRY';

type InTransaction = <T>(work: (m: EntityManager) => Promise<T>) => Promise<T>;

/**
 * Validates the whole file, then writes it set-based in one transaction, or writes nothing.
 * A clash with a concurrent writer rolls back and is checked again, so it comes back as a 422 line.
 * A caller that holds a transaction (the demo loader) passes its manager and owns the commit, and may
 * pass the local date its own plan was made for, so jar statuses cannot straddle a midnight.
 */
/** An uploaded history file, imported whole or refused with every error by line (422) and nothing written. */
export async function importHistoryUpload(actor: Actor, file: Buffer | undefined): Promise<ImportResult> {
  if (!file) {
    throw badRequest('file: send the history as a text/csv body or as the multipart field "file"', [
      { path: 'file', message: 'is required: a CSV file (text/csv body or multipart field "file")' },
    ]);
  }
  const outcome = await importHistory(actor, file);
  if (outcome.ok) return outcome.result;
  const n = outcome.errors.length;
  const message = `The file has ${n} problem${n === 1 ? '' : 's'}; nothing was imported.`;
  throw new AppError(422, 'import-rejected', message, undefined, {
    errors: outcome.errors,
  } satisfies ImportRejection);
}

export async function importHistory(
  actor: Actor,
  file: Buffer,
  manager?: EntityManager,
  today?: string,
): Promise<HistoryImportOutcome> {
  if (manager) return attempt(actor, file, (work) => work(manager), today);
  const own: InTransaction = (work) => dataSource.transaction(work);
  try {
    return await attempt(actor, file, own);
  } catch (err) {
    if (isDuplicateKey(err)) return attempt(actor, file, own);
    throw err;
  }
}

async function attempt(
  actor: Actor,
  file: Buffer,
  inTransaction: InTransaction,
  today?: string,
): Promise<HistoryImportOutcome> {
  const parsed = parseHistoryCsv(file);
  if (!parsed.ok) return { ok: false, errors: parsed.errors };
  const errors: ImportError[] = [];
  const header = mapHeader(parsed.header, errors);
  if (errors.length) return { ok: false, errors: sortErrors(errors) };
  const rows = parsed.records
    .filter((r) => !isBlankRecord(r))
    .map((r) => readRow(r, header, errors))
    .filter((r): r is HistoryRow => r !== null);
  if (rows.length === 0 && errors.length === 0) {
    return { ok: false, errors: [{ line: 1, column: '', message: 'the file holds no rows below the header' }] };
  }

  return inTransaction(async (m) => {
    const ctx = await loadContext(m, rows);
    checkRows(rows, ctx, errors);
    if (errors.length) return { ok: false as const, errors: sortErrors(errors) };
    const imported = await writeRows(m, actor, rows, ctx, today);
    await recordAudit(m, actor, [
      {
        action: 'import',
        recordType: 'import',
        recordId: randomUUID(),
        newValue: { ...imported, rows: rows.length, ignoredColumns: header.ignoredColumns },
      },
    ]);
    return {
      ok: true as const,
      result: {
        imported: { jars: imported.jars, incidents: imported.incidents },
        ignoredColumns: header.ignoredColumns,
      },
    };
  });
}

/** The first spelling seen of each new code, keyed like the collation compares. */
function firstOf<T>(
  rows: HistoryRow[],
  code: (r: HistoryRow) => string,
  stored: Map<string, unknown>,
  make: (r: HistoryRow) => T,
) {
  const out = new Map<string, T>();
  for (const r of rows) {
    const key = matchKey(code(r));
    if (!stored.has(key) && !out.has(key)) out.set(key, make(r));
  }
  return [...out.values()];
}

/** Operators without an account join the staff list (matched without regard to case) and are linked to it. */
async function withStaff(
  m: EntityManager,
  sessions: { code: string; heldOn: string; operatorId: number | null; operatorName: string }[],
) {
  const staff = await staffForNames(
    m,
    sessions.filter((s) => s.operatorId === null).map((s) => s.operatorName),
  );
  const byKey = new Map(staff.map((p) => [matchKey(p.name), p]));
  return sessions.map((s) => {
    const person = s.operatorId === null ? byKey.get(matchKey(s.operatorName)) : undefined;
    return { ...s, staffId: person?.id ?? null, operatorName: person?.name ?? s.operatorName };
  });
}

async function writeRows(
  m: EntityManager,
  actor: Actor,
  rows: HistoryRow[],
  ctx: HistoryContext,
  asOf: string | undefined,
) {
  const newCookRuns = firstOf(
    rows,
    (r) => r.cookRun,
    ctx.cookRuns,
    (r) => ({ code: r.cookRun, minutesAtPressure: r.cookMinutes }),
  );
  const newSessions = firstOf(
    rows,
    (r) => r.session,
    ctx.sessions,
    (r) => {
      const op = resolveOperator(ctx, r.operator);
      return { code: r.session, heldOn: r.inoculatedOn, operatorId: op.userId, operatorName: op.name };
    },
  );
  const newCultures = firstOf(
    rows,
    (r) => r.culture,
    ctx.cultures,
    (r) => ({ code: r.culture }),
  );
  // Through the modules that own these records, so their rules (free codes, the F0 estimate, an audit
  // row per record) hold for imported rows as for rows made on a screen.
  await insertCookRuns(m, actor, newCookRuns);
  await insertSessions(m, actor, await withStaff(m, newSessions), { history: true });
  await insertCultures(m, actor, newCultures, 'released');

  const ids = await loadCodes(m, rows);
  const idOf = (map: Map<string, { id: number }>, code: string) => {
    const found = map.get(matchKey(code));
    if (!found) throw new Error(`imported code ${code} was not found after insert`);
    return found.id;
  };

  const timeZone = config().LAB_TIME_ZONE;
  const today = asOf ?? localDate(new Date(), timeZone);
  const { observationWindowDays } = await getLabSettings(m);
  const noon = new Map<string, Date>();
  const noonOf = (date: string) => {
    let at = noon.get(date);
    if (!at) noon.set(date, (at = labNoon(date, timeZone)));
    return at;
  };

  const jars: HistoryJar[] = rows.map((r) => ({
    label: r.label,
    grainId: ctx.grainIds.get(matchKey(r.grain)) ?? 0,
    cookRunId: idOf(ids.cookRuns, r.cookRun),
    sessionId: idOf(ids.sessions, r.session),
    cultureId: idOf(ids.cultures, r.culture),
    status:
      r.outcome === 'contaminated'
        ? 'contaminated'
        : daysBetween(r.inoculatedOn, today) < observationWindowDays
          ? 'incubating'
          : 'colonised',
    inoculatedAt: noonOf(r.inoculatedOn),
    inoculatedOn: r.inoculatedOn,
    endedOn: r.outcome === 'contaminated' ? r.foundOn : null,
  }));
  const jarIds = await insertHistoryJars(m, jars);

  const contaminated = rows.filter((r) => r.outcome === 'contaminated');
  const incidents: HistoryIncident[] = contaminated.map((r) => {
    const op = resolveOperator(ctx, r.operator);
    const foundOn = r.foundOn ?? r.inoculatedOn;
    const jarId = jarIds.get(r.label);
    if (jarId === undefined) throw new Error(`jar ${r.label} was not found after insert`);
    return {
      jarId,
      foundAt: noonOf(foundOn),
      foundOn,
      foundById: op.userId,
      foundByName: op.name,
      contaminant: r.contaminant ?? 'unknown',
      createdById: actor.id,
    };
  });
  await insertHistoryIncidents(m, incidents);
  // Counted once both the jars and their incidents are in.
  await recountJars(m, jarIds.values());
  return {
    jars: jars.length,
    incidents: incidents.length,
    cookRuns: newCookRuns.length,
    sessions: newSessions.length,
    cultures: newCultures.length,
  };
}
