import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { CookRun } from '../../server/cook-runs/cook-run.entity';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { postCsvAs, sendAs, signedIn, uniqueName } from '../setup/factories';
import { runOf } from './cook-runs.fixtures';
import { csv, rejectionOf, row } from './imports.fixtures';

// The history import writes through the cook-runs module's own insert, so the rules a run made on the
// screen obeys hold for an imported one too: the F0 estimate from its minutes and its audit row.
const app = createTestApp();

// As the cook-runs screen sends it; the gauge is left empty, as a history file leaves it.
const screenRun = (code: string, minutesAtPressure: number) => ({
  code,
  vessel: 'Cooker A',
  cookedOn: '2026-03-02',
  minutesAtPressure,
  altitudeM: 0,
  container: '1 L jar',
  loadCount: 7,
});

/** One clean jar whose cook run took `minutes` at pressure. */
const historyFile = (tag: string, minutes: string) => csv([row(tag, 1, { cook_minutes: minutes })]);

describe('history import through the cook-runs module', () => {
  it('gives an imported run the same F0 estimate as a run of the same minutes made on the screen', async () => {
    const sup = await signedIn(app, 'supervisor');
    const tag = uniqueName('M');
    await postCsvAs(sup, '/api/imports/history', historyFile(tag, '75')).expect(200);
    const made = await sendAs(sup, 'post', '/api/cook-runs', screenRun(`${tag}-SCREEN`, 75));
    expect(made.status).toBe(201);

    const imported = await dataSource.manager.findOneByOrFail(CookRun, { code: `${tag}-CR` });
    expect(imported.f0Source).toBe('estimate');
    expect(imported.f0).not.toBeNull();
    expect(imported.f0).toBe(runOf(made).f0);
    expect(imported.f0Source).toBe(runOf(made).f0Source);
  });

  it('records a create audit row for each imported run, by the importing supervisor', async () => {
    const sup = await signedIn(app, 'supervisor');
    const tag = uniqueName('M');
    await postCsvAs(sup, '/api/imports/history', historyFile(tag, '90')).expect(200);
    const run = await dataSource.manager.findOneByOrFail(CookRun, { code: `${tag}-CR` });
    const audits = await dataSource.manager.findBy(AuditEvent, { recordType: 'cook-run', recordId: String(run.id) });
    expect(audits.map((a) => [a.action, a.userId])).toEqual([['create', sup.user.id]]);
  });

  it('refuses a run whose code a screen-made run already holds with other minutes, and writes no jar', async () => {
    const sup = await signedIn(app, 'supervisor');
    const tag = uniqueName('M');
    await sendAs(sup, 'post', '/api/cook-runs', screenRun(`${tag}-CR`, 60)).expect(201);
    const res = await postCsvAs(sup, '/api/imports/history', historyFile(tag, '90'));
    expect(res.status).toBe(422);
    expect(rejectionOf(res).errors.map((e) => e.column)).toContain('cook_minutes');
    const [jar] = await dataSource.query<{ n: string }[]>('SELECT COUNT(*) AS n FROM jars WHERE label = ?', [
      `${tag}-J1`,
    ]);
    expect(Number(jar?.n)).toBe(0);
  });
});
