import { describe, expect, it } from 'vitest';
import { historyFile } from '../../scripts/history-file';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { CookRun } from '../../server/cook-runs/cook-run.entity';
import { Culture } from '../../server/cultures/culture.entity';
import { dataSource } from '../../server/db/data-source';
import { Incident } from '../../server/incidents/incident.entity';
import { IncidentJar } from '../../server/incidents/incident-jar.entity';
import { Jar } from '../../server/jars/jar.entity';
import { InoculationSession } from '../../server/sessions/inoculation-session.entity';
import { localDate } from '../../server/core/local-time';
import { createTestApp } from '../setup/test-app';
import { uniqueName } from '../setup/factories';
import { counts, csv, importingSupervisor, resultOf, row, tables, type Row } from './imports.fixtures';

const app = createTestApp();
const supervisor = () => importingSupervisor(app);

describe('POST /api/imports/history — what is written', () => {
  it('writes exactly the jars, incidents, runs, sessions and cultures of the file, with one audit event for the import and one for each run, session and culture made', async () => {
    const sup = await supervisor();
    const tag = uniqueName('P');
    const today = localDate(new Date());
    const recent = new Date(Date.parse(`${today}T12:00:00Z`) - 5 * 86_400_000).toISOString().slice(0, 10);
    const contaminated = (n: number, contaminant: string, found: string, over: Partial<Row> = {}) =>
      row(tag, n, { outcome: 'contaminated', contaminant, found_on: found, ...over });
    const file = csv([
      row(tag, 1),
      contaminated(2, 'bacterial', '2026-03-05'),
      contaminated(3, 'Green Mould (Trichoderma)', '2026-03-12'),
      row(tag, 4, {
        cook_run: `${tag}-CR2`,
        cook_minutes: '45',
        session: `${tag}-S2`,
        inoculated_on: '2026-07-06',
        operator: sup.user.username,
      }),
      contaminated(5, 'pin-mould', '2026-07-08', {
        cook_run: `${tag}-CR2`,
        cook_minutes: '45',
        session: `${tag}-S2`,
        inoculated_on: '2026-07-06',
        operator: sup.user.username,
      }),
      row(tag, 6, { session: `${tag}-S3`, inoculated_on: recent, culture: `${tag}-LC2` }),
    ]);
    const before = await counts();
    const res = await sup.post(file);
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ imported: { jars: 6, incidents: 3 }, ignoredColumns: [] });
    const after = await counts();
    expect(Object.fromEntries(tables.map((t) => [t, (after[t] ?? 0) - (before[t] ?? 0)]))).toEqual({
      jars: 6,
      incidents: 3,
      incident_jars: 3,
      cook_runs: 2,
      inoculation_sessions: 3,
      cultures: 2,
      // One for the import; each run, session and culture is audited by its own module as it is made.
      audit_events: 1 + 2 + 3 + 2,
    });

    const jars = await dataSource.manager.find(Jar, {
      where: { cookRunId: (await dataSource.manager.findOneByOrFail(CookRun, { code: `${tag}-CR` })).id },
      order: { label: 'ASC' },
    });
    expect(jars.map((j) => [j.label, j.status, j.imported])).toEqual([
      [`${tag}-J1`, 'colonised', true],
      [`${tag}-J2`, 'contaminated', true],
      [`${tag}-J3`, 'contaminated', true],
      [`${tag}-J6`, 'incubating', true],
    ]);
    // Noon in Europe/London: GMT (UTC+0) in March, BST (UTC+1) in July —
    // Summer Time Order 2002 / EU Directive 2000/84/EC, last Sunday of March to last Sunday of October.
    expect(jars[0]!.inoculatedAt.toISOString()).toBe('2026-03-02T12:00:00.000Z');
    const july = await dataSource.manager.findOneByOrFail(Jar, { label: `${tag}-J4` });
    expect(july.inoculatedAt.toISOString()).toBe('2026-07-06T11:00:00.000Z');
    expect(july.inoculatedOn).toBe('2026-07-06');

    const run2 = await dataSource.manager.findOneByOrFail(CookRun, { code: `${tag}-CR2` });
    expect(run2.minutesAtPressure).toBe(45);
    const s2 = await dataSource.manager.findOneByOrFail(InoculationSession, { code: `${tag}-S2` });
    expect(s2).toMatchObject({ heldOn: '2026-07-06', operatorId: sup.user.id, operatorName: sup.user.displayName });
    const culture = await dataSource.manager.findOneByOrFail(Culture, { code: `${tag}-LC2` });
    expect(culture.state).toBe('released');

    const incidents = await dataSource.manager
      .createQueryBuilder(Incident, 'i')
      .innerJoin(IncidentJar, 'ij', 'ij.incidentId = i.id')
      .innerJoin(Jar, 'j', 'j.id = ij.jarId')
      .addSelect('j.label', 'label')
      .where('j.label LIKE :p', { p: `${tag}-%` })
      .orderBy('j.label')
      .getMany();
    expect(
      incidents.map((i) => [
        i.contaminant,
        i.foundOn,
        i.foundAt.toISOString(),
        i.status,
        i.verdict,
        i.imported,
        i.stage,
        i.voided,
      ]),
    ).toEqual([
      ['bacterial', '2026-03-05', '2026-03-05T12:00:00.000Z', 'closed', 'confirmed', true, 'incubation', false],
      ['trichoderma', '2026-03-12', '2026-03-12T12:00:00.000Z', 'closed', 'confirmed', true, 'incubation', false],
      ['pin-mould', '2026-07-08', '2026-07-08T11:00:00.000Z', 'closed', 'confirmed', true, 'incubation', false],
    ]);
    expect(incidents.map((i) => [i.foundByName, i.foundById])).toEqual([
      ['Orla Vance', null],
      ['Orla Vance', null],
      [sup.user.displayName, sup.user.id],
    ]);

    const audit = await dataSource.manager.find(AuditEvent, { where: { action: 'import', userId: sup.user.id } });
    expect(audit).toHaveLength(1);
    expect(audit[0]!.recordType).toBe('import');
    expect(JSON.parse(audit[0]!.newValue ?? '{}')).toMatchObject({
      jars: 6,
      incidents: 3,
      cookRuns: 2,
      sessions: 3,
      cultures: 2,
    });
  });

  it('adds jars to cook runs, sessions and cultures already stored when their attributes agree', async () => {
    const sup = await supervisor();
    const tag = uniqueName('Q');
    await sup.post(csv([row(tag, 1)])).expect(200);
    const before = await counts();
    const res = await sup.post(
      csv([row(tag, 2, { cook_run: `${tag}-cr`, session: `${tag}-s`, operator: 'ORLA VANCE', culture: `${tag}-lc` })]),
    );
    expect(res.status).toBe(200);
    const after = await counts();
    expect([
      after.jars! - before.jars!,
      after.cook_runs! - before.cook_runs!,
      after.inoculation_sessions! - before.inoculation_sessions!,
      after.cultures! - before.cultures!,
    ]).toEqual([1, 0, 0, 0]);
  });

  // How fast is for the bench, not a test: the time limit here only stops a hang.
  it('imports a file of 50,000 rows with their 2,000 incidents in one go', { timeout: 600_000 }, async () => {
    const sup = await supervisor();
    const tag = uniqueName('Z');
    const res = await sup.post(historyFile(tag, 50_000));
    expect(res.status).toBe(200);
    expect(resultOf(res).imported).toEqual({ jars: 50_000, incidents: 2_000 });
  });
});
