import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { CookRunReading } from '../../server/cook-runs/cook-run-reading.entity';
import { dataSource } from '../../server/db/data-source';
import { defaultContainerMinutes } from '../../shared/stats/cook-verdict';
import { createTestApp } from '../setup/test-app';
import { anonymousStatuses, postCsvAs, sendAs, signedIn, uniqueName, type Client } from '../setup/factories';

const app = createTestApp();

const newRun = (over: Record<string, unknown> = {}) => ({
  code: uniqueName('CR'),
  vessel: 'Cooker A',
  cookedOn: '2026-03-02',
  minutesAtPressure: 90,
  gaugeKPa: 103.4,
  altitudeM: 0,
  container: '1 L jar',
  loadCount: 7,
  ...over,
});

// The 1-minute cycle of TRADE.md §3 [COMP]: F0 = 12.239 by the rectangle rule, from L = 10^((T − 121.1)/10)
// (PDA Technical Report No. 1, rev. 2007; Pistolesi & Mascherpa, F0: a technical note, 1988, rev. 2014).
const cycleCelsius = [100, 105, 110, 115, 118, 120, ...Array<number>(10).fill(121), 118, 115, 110, 105, 100];
const cycleCsv = (header: string, eol = '\n') => [header, ...cycleCelsius.map((c, m) => `${m},${c}`)].join(eol) + eol;

let tech: Client;
let admin: Client;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
  admin = await signedIn(app, 'admin');
});
// Other files sharing this worker's database read the default container minimums.
afterAll(() =>
  dataSource.query('UPDATE lab_settings SET containerMinutes = ? WHERE id = 1', [
    JSON.stringify(defaultContainerMinutes),
  ]),
);

const create = (client: Client, body: Record<string, unknown>) => sendAs(client, 'post', '/api/cook-runs', body);
const postLog = (client: Client, id: number, csv: string) => postCsvAs(client, `/api/cook-runs/${id}/readings`, csv);

describe('/api/cook-runs guards and validation', () => {
  it('answers 401 without a session', async () => {
    const urls = ['/api/cook-runs', '/api/cook-runs/1', '/api/cook-runs/export.csv'];
    expect(await anonymousStatuses(app, urls)).toEqual([401, 401, 401]);
  });

  it('lets a trainer read but answers 403 to every write', async () => {
    const trainer = await signedIn(app, 'trainer');
    const run = (await create(tech, newRun())).body;
    expect((await trainer.agent.get(`/api/cook-runs/${run.id}`)).status).toBe(200);
    expect((await create(trainer, newRun())).status).toBe(403);
    const patch = await sendAs(trainer, 'patch', `/api/cook-runs/${run.id}`, { loadCount: 3 });
    expect(patch.status).toBe(403);
    const upload = await postLog(trainer, run.id, cycleCsv('minute,celsius'));
    expect(upload.status).toBe(403);
  });

  it.each([
    ['minutesAtPressure', { minutesAtPressure: 90.5 }],
    ['minutesAtPressure', { minutesAtPressure: undefined }],
    ['container', { container: undefined }],
    ['cookedOn', { cookedOn: undefined }],
    ['cookedOn', { cookedOn: '2026-02-30' }],
    ['gaugeKPa', { gaugeKPa: -5 }],
    ['code', { code: 'has space' }],
    ['operatorName', { operatorId: 1, operatorName: 'Both Given' }],
  ])('answers 400 naming %s', async (field, over) => {
    const res = await create(tech, newRun(over));
    expect(res.status).toBe(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
  });

  it('answers 400 naming operatorId for an unknown user', async () => {
    const res = await create(tech, newRun({ operatorId: 999999 }));
    expect(res.status).toBe(400);
    expect(res.body.error.issues[0].path).toBe('operatorId');
  });

  it('answers 400 for a bad sort field and an oversized page', async () => {
    const sort = await tech.agent.get('/api/cook-runs?sort=-vessel');
    expect(sort.status).toBe(400);
    expect(sort.body.error.issues[0].path).toBe('sort');
    expect((await tech.agent.get('/api/cook-runs?pageSize=201')).body.error.issues[0].path).toBe('pageSize');
  });

  it('answers 404 for an unknown cook run', async () => {
    expect((await tech.agent.get('/api/cook-runs/999999')).status).toBe(404);
    const patch = await sendAs(tech, 'patch', '/api/cook-runs/999999', { loadCount: 2 });
    expect(patch.status).toBe(404);
    const upload = await postLog(tech, 999999, cycleCsv('minute,celsius'));
    expect(upload.status).toBe(404);
    expect((await tech.agent.get('/api/cook-runs/999999/readings')).status).toBe(404);
  });

  it('answers 409 naming code when the code is taken', async () => {
    const body = newRun();
    expect((await create(tech, body)).status).toBe(201);
    const res = await create(tech, { ...body, vessel: 'Other' });
    expect(res.status).toBe(409);
    expect(res.body.error.issues[0].path).toBe('code');
  });
});

describe('/api/cook-runs lethality', () => {
  it('estimates F0 as an upper bound at sea level and writes an audit event', async () => {
    // TRADE.md §3 [COMP]: 15 psig at 101.325 kPa → 120.95 °C (IAPWS R7-97(2012) region 4; ISO 2533:1975),
    // so 90 min gives F0 = 90 × 10^((120.95 − 121.1)/10) ≈ 87.
    const res = await create(tech, newRun({ gaugeKPa: 103.4 }));
    expect(res.status).toBe(201);
    expect(res.body.f0Source).toBe('estimate');
    expect(res.body.f0Label).toBe('estimated upper bound');
    expect(res.body.sterilisingTemperatureC).toBeCloseTo(120.95, 1);
    expect(res.body.f0).toBeCloseTo(90 * 10 ** ((res.body.sterilisingTemperatureC - 121.1) / 10), 9);
    expect(res.body.f0).toBeGreaterThan(86.5);
    expect(res.body.f0).toBeLessThan(87.5);
    // 1 psi = 6894.757 Pa (NIST SP 811, 2008, appendix B.8 — quoted from memory), so 103.4 kPa reads as 15.00 psi.
    expect(res.body.gaugePsi).toBeCloseTo(15.0, 2);
    expect(res.body.readingsCount).toBe(0);
    expect(res.body.belowTarget).toBe(false);
    expect(res.body.lethalityTarget).toBe(15);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'cook-run',
      recordId: String(res.body.id),
      action: 'create',
    });
    expect(audit?.userName).toBe('Test technician');
  });

  it('uses 103.4 kPa when no gauge pressure was read, and lowers the estimate with altitude', async () => {
    // TRADE.md §3 [COMP]: 15 psig at 1,500 m → 118.3 °C, so a 90-min hold gives F0 ≈ 47 instead of ≈ 87.
    const res = await create(tech, newRun({ gaugeKPa: null, altitudeM: 1500 }));
    expect(res.body.gaugeKPa).toBeNull();
    expect(res.body.gaugePsi).toBeNull();
    expect(res.body.sterilisingTemperatureC).toBeCloseTo(118.3, 1);
    expect(Math.round(res.body.f0)).toBe(47);
  });

  it('judges a run without a jar-centre log by its minutes against the container minimum, whatever its F0', async () => {
    // DESIGN §4.6: 45 min of 1 L jars has an estimated F0 ≈ 43.5 (120.95 °C, TRADE.md §3 [COMP]) — far above
    // the F0 target of 15, yet below the 90-min minimum for 1 L jars (TRADE.md §1, common practice).
    const container = uniqueName('bag');
    await sendAs(admin, 'patch', '/api/settings', {
      containerMinutes: { ...defaultContainerMinutes, [container]: 90 },
    }).expect(200);
    const short = (await create(tech, newRun({ minutesAtPressure: 45, container }))).body;
    const good = (await create(tech, newRun({ container }))).body;
    expect(short.f0).toBeCloseTo(45 * 10 ** ((120.95 - 121.1) / 10), 0);
    expect(short).toMatchObject({ judgedBy: 'minutes', minimumMinutes: 90, f0UpperBound: true, belowTarget: true });
    expect(good).toMatchObject({ judgedBy: 'minutes', belowTarget: false });
    const ids = async (query: string) =>
      (await tech.agent.get(`/api/cook-runs?container=${encodeURIComponent(container)}&${query}`)).body.items.map(
        (r: { id: number }) => r.id,
      );
    expect(await ids('belowTarget=true')).toEqual([short.id]);
    expect(await ids('belowTarget=false')).toEqual([good.id]);
    expect(await ids('lowLethality=true')).toEqual([short.id]);
  });

  it('leaves a run unjudged when its container has no minimum', async () => {
    const res = await create(tech, newRun({ minutesAtPressure: 5, container: uniqueName('crate') }));
    expect(res.body).toMatchObject({ judgedBy: 'unjudged', minimumMinutes: null, belowTarget: false });
  });

  it('computes F0 from an uploaded log (text/csv, BOM, CRLF, any header case) and stores every reading', async () => {
    const run = (await create(tech, newRun())).body;
    const res = await postLog(tech, run.id, '\uFEFF' + cycleCsv('Minute,Temp_C', '\r\n'));
    expect(res.status).toBe(200);
    expect(res.body.f0).toBeCloseTo(12.239, 3);
    expect(res.body.f0Source).toBe('log');
    expect(res.body.f0Label).toBe('from temperature log');
    expect(res.body.readingsCount).toBe(21);
    // A log of unstated placement counts as a chamber log: an upper bound that cannot fail or pass on F0.
    expect(res.body).toMatchObject({ logPlacement: 'chamber', judgedBy: 'minutes', f0UpperBound: true });
    expect(res.body.belowTarget).toBe(false);
    const readings = await tech.agent.get(`/api/cook-runs/${run.id}/readings`);
    expect(readings.body.readings).toHaveLength(21);
    // L(115) = 0.24547 and L(121.0) = 0.97724 — TRADE.md §3 [COMP], same sources as above.
    expect(readings.body.readings[3]).toMatchObject({ minute: 3, celsius: 115 });
    expect(readings.body.readings[3].lethalRate).toBeCloseTo(0.24547, 5);
    expect(readings.body.readings[6].lethalRate).toBeCloseTo(0.97724, 5);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'cook-run',
      recordId: String(run.id),
      action: 'readings',
      field: 'f0',
    });
    expect(Number(audit?.newValue)).toBeCloseTo(12.239, 3);
  });

  it('holds a jar-centre log to the F0 target and refuses an unknown placement', async () => {
    const run = (await create(tech, newRun())).body;
    const res = await postCsvAs(tech, `/api/cook-runs/${run.id}/readings?placement=centre`, cycleCsv('minute,celsius'));
    expect(res.status).toBe(200);
    // F0 12.239 from the cycle of TRADE.md §3 [COMP] is below the default target of 15.
    expect(res.body).toMatchObject({ logPlacement: 'centre', judgedBy: 'centre-probe', f0UpperBound: false });
    expect(res.body.belowTarget).toBe(true);
    const bad = await postCsvAs(tech, `/api/cook-runs/${run.id}/readings?placement=lid`, cycleCsv('minute,celsius'));
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('placement');
  });

  it('accepts the multipart field file and replaces an earlier log', async () => {
    const run = (await create(tech, newRun())).body;
    const post = (body: string) =>
      tech.agent
        .post(`/api/cook-runs/${run.id}/readings`)
        .set('X-CSRF-Token', tech.token())
        .attach('file', Buffer.from(body, 'utf8'), { filename: 'log.csv', contentType: 'text/csv' });
    expect((await post(cycleCsv('elapsed_min,temperature'))).body.readingsCount).toBe(21);
    // 15 min at 121.1 °C is F0 = 15 by definition (same sources); three samples 0, 7.5, 15 hold it for 22.5 min by the rectangle rule.
    const second = await post('minutes,celsius\n0,121.1\n7.5,121.1\n15,121.1\n');
    expect(second.status).toBe(200);
    expect(second.body.readingsCount).toBe(3);
    expect(second.body.f0).toBeCloseTo(22.5, 9);
    expect(await dataSource.manager.countBy(CookRunReading, { cookRunId: run.id })).toBe(3);
  });

  it('answers 422 with every bad line and stores nothing', async () => {
    const run = (await create(tech, newRun())).body;
    const res = await postLog(tech, run.id, 'minute,celsius\n0,100\n\n1,hot\n1,120\n3,999\n');
    expect(res.status).toBe(422);
    const messages = res.body.error.issues.map((i: { path: string; message: string }) => `${i.path}|${i.message}`);
    expect(messages).toEqual([
      'file|line 4, celsius: must be a temperature in °C (got "hot")',
      'file|line 5, minute: must be later than the row before (1)',
      'file|line 6, celsius: must be between -50 and 200 °C',
    ]);
    const detail = await tech.agent.get(`/api/cook-runs/${run.id}`);
    expect(detail.body).toMatchObject({ readingsCount: 0, f0Source: 'estimate', f0: run.f0 });
  });

  it('answers 422 on line 1 when a column is missing and 400 naming file when no log is sent', async () => {
    const run = (await create(tech, newRun())).body;
    const res = await postLog(tech, run.id, 'time,celsius\n0,100\n1,101\n');
    expect(res.status).toBe(422);
    expect(res.body.error.issues[0].message).toMatch(/^line 1, minute: no elapsed-minutes column/);
    const empty = await sendAs(tech, 'post', `/api/cook-runs/${run.id}/readings`, {});
    expect(empty.status).toBe(400);
    expect(empty.body.error.issues[0].path).toBe('file');
  });

  it('removes a log and falls back to the estimate', async () => {
    const run = (await create(tech, newRun())).body;
    await postLog(tech, run.id, cycleCsv('minute,celsius')).expect(200);
    const res = await sendAs(tech, 'delete', `/api/cook-runs/${run.id}/readings`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ f0Source: 'estimate', readingsCount: 0 });
    expect(res.body.f0).toBeCloseTo(run.f0, 9);
  });
});

describe('/api/cook-runs editing, listing and export', () => {
  it('audits each changed field with its old and new value and re-estimates F0', async () => {
    const run = (await create(tech, newRun())).body;
    const res = await sendAs(tech, 'patch', `/api/cook-runs/${run.id}`, {
      minutesAtPressure: 120,
      vessel: 'Cooker B',
      reason: 'gauge log re-read',
    });
    expect(res.status).toBe(200);
    expect(res.body.minutesAtPressure).toBe(120);
    expect(res.body.f0).toBeCloseTo((run.f0 / 90) * 120, 6);
    const events = await dataSource.manager.findBy(AuditEvent, {
      recordType: 'cook-run',
      recordId: String(run.id),
      action: 'update',
    });
    const byField = Object.fromEntries(events.map((e) => [e.field, e]));
    expect(byField.minutesAtPressure).toMatchObject({ oldValue: '90', newValue: '120', reason: 'gauge log re-read' });
    expect(byField.vessel).toMatchObject({ oldValue: 'Cooker A', newValue: 'Cooker B' });
    expect(byField.f0).toBeDefined();
    expect(byField.loadCount).toBeUndefined();
  });

  it('takes the run date from the start time in the lab time zone (Europe/London)', async () => {
    const res = await create(tech, newRun({ cookedOn: undefined, startedAt: '2026-06-30T23:30:00Z' }));
    expect(res.status).toBe(201);
    expect(res.body.cookedOn).toBe('2026-07-01');
    expect(res.body.startedAt).toBe('2026-06-30T23:30:00.000Z');
  });

  it('keeps a user operator by id and name', async () => {
    const res = await create(tech, newRun({ operatorId: tech.user.id }));
    expect(res.body).toMatchObject({ operatorId: tech.user.id, operatorName: 'Test technician' });
  });

  it('pages, sorts and filters on the server', async () => {
    const container = uniqueName('jar');
    for (const [minutes, day] of [
      [60, '2026-01-05'],
      [150, '2026-01-06'],
      [90, '2026-01-07'],
    ] as const) {
      await create(tech, newRun({ container, minutesAtPressure: minutes, cookedOn: day }));
    }
    const c = encodeURIComponent(container);
    const page1 = await tech.agent.get(`/api/cook-runs?container=${c}&sort=-minutesAtPressure&pageSize=2`);
    expect(page1.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(page1.body.items.map((r: { minutesAtPressure: number }) => r.minutesAtPressure)).toEqual([150, 90]);
    const page2 = await tech.agent.get(`/api/cook-runs?container=${c}&sort=-minutesAtPressure&pageSize=2&page=2`);
    expect(page2.body.items.map((r: { minutesAtPressure: number }) => r.minutesAtPressure)).toEqual([60]);
    const ranged = await tech.agent.get(`/api/cook-runs?container=${c}&from=2026-01-06&to=2026-01-07&sort=cookedOn`);
    expect(ranged.body.items.map((r: { cookedOn: string }) => r.cookedOn)).toEqual(['2026-01-06', '2026-01-07']);
    const byF0 = await tech.agent.get(`/api/cook-runs?container=${c}&sort=f0`);
    expect(byF0.body.items.map((r: { minutesAtPressure: number }) => r.minutesAtPressure)).toEqual([60, 90, 150]);
  });

  it('exports every matching run as CSV', async () => {
    const container = uniqueName('3kg');
    const a = (await create(tech, newRun({ container, notes: 'first, with a comma' }))).body;
    const b = (await create(tech, newRun({ container }))).body;
    const res = await tech.agent.get(`/api/cook-runs/export.csv?container=${encodeURIComponent(container)}&sort=code`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe(
      'code,cooked_on,started_at,vessel,container,minutes_at_pressure,gauge_kpa,gauge_psi,venting_minutes,altitude_m,load_count,operator,f0,f0_source,log_placement,judged_by,minimum_minutes,below_target,notes',
    );
    expect(lines).toHaveLength(3);
    const codes = [a.code, b.code].sort();
    expect(lines[1]!.startsWith(`${codes[0]},2026-03-02,`)).toBe(true);
    expect(res.text).toContain('"first, with a comma"');
    expect(res.text).toContain('estimated upper bound');
  });
});
