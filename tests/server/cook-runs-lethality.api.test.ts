import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { CookRunReading } from '../../server/cook-runs/cook-run-reading.entity';
import { dataSource } from '../../server/db/data-source';
import { defaultContainerMinutes } from '../../shared/stats/cook-verdict';
import { createTestApp } from '../setup/test-app';
import { postCsvAs, sendAs, signedIn, uniqueName, type Client } from '../setup/factories';
import { cookRunReadingsSchema } from '../../shared/schemas/cook-runs';
import { create, createdRun, cycleCsv, newRun, postLog, runOf, runPageSchema } from './cook-runs.fixtures';
import { bodyOf, errorOf, issuePath } from '../setup/bodies';

const app = createTestApp();

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

describe('/api/cook-runs lethality', () => {
  it('estimates F0 as an upper bound at sea level and writes an audit event', async () => {
    // TRADE.md §3 [COMP]: 15 psig at 101.325 kPa → 120.95 °C (IAPWS R7-97(2012) region 4; ISO 2533:1975),
    // so 90 min gives F0 = 90 × 10^((120.95 − 121.1)/10) ≈ 87.
    const res = await create(tech, newRun({ gaugeKPa: 103.4 }));
    expect(res.status).toBe(201);
    expect(runOf(res).f0Source).toBe('estimate');
    expect(runOf(res).f0Label).toBe('estimated upper bound');
    expect(runOf(res).sterilisingTemperatureC).toBeCloseTo(120.95, 1);
    expect(runOf(res).f0).toBeCloseTo(90 * 10 ** ((runOf(res).sterilisingTemperatureC! - 121.1) / 10), 9);
    expect(runOf(res).f0).toBeGreaterThan(86.5);
    expect(runOf(res).f0).toBeLessThan(87.5);
    // 1 psi = 6894.757 Pa (NIST SP 811, 2008, appendix B.8 — quoted from memory), so 103.4 kPa reads as 15.00 psi.
    expect(runOf(res).gaugePsi).toBeCloseTo(15.0, 2);
    expect(runOf(res).readingsCount).toBe(0);
    expect(runOf(res).belowTarget).toBe(false);
    expect(runOf(res).lethalityTarget).toBe(15);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'cook-run',
      recordId: String(runOf(res).id),
      action: 'create',
    });
    expect(audit?.userName).toBe('Test technician');
  });

  it('uses 103.4 kPa when no gauge pressure was read, and lowers the estimate with altitude', async () => {
    // TRADE.md §3 [COMP]: 15 psig at 1,500 m → 118.3 °C, so a 90-min hold gives F0 ≈ 47 instead of ≈ 87.
    const res = await create(tech, newRun({ gaugeKPa: null, altitudeM: 1500 }));
    expect(runOf(res).gaugeKPa).toBeNull();
    expect(runOf(res).gaugePsi).toBeNull();
    expect(runOf(res).sterilisingTemperatureC).toBeCloseTo(118.3, 1);
    expect(Math.round(runOf(res).f0!)).toBe(47);
  });

  it('judges a run without a jar-centre log by its minutes against the container minimum, whatever its F0', async () => {
    // DESIGN §4.6: 45 min of 1 L jars has an estimated F0 ≈ 43.5 (120.95 °C, TRADE.md §3 [COMP]) — far above
    // the F0 target of 15, yet below the 90-min minimum for 1 L jars (TRADE.md §1, common practice).
    const container = uniqueName('bag');
    await sendAs(admin, 'patch', '/api/settings', {
      containerMinutes: { ...defaultContainerMinutes, [container]: 90 },
    }).expect(200);
    const short = await createdRun(tech, newRun({ minutesAtPressure: 45, container }));
    const good = await createdRun(tech, newRun({ container }));
    expect(short.f0).toBeCloseTo(45 * 10 ** ((120.95 - 121.1) / 10), 0);
    expect(short).toMatchObject({ judgedBy: 'minutes', minimumMinutes: 90, f0UpperBound: true, belowTarget: true });
    expect(good).toMatchObject({ judgedBy: 'minutes', belowTarget: false });
    const ids = async (query: string) =>
      bodyOf(
        await tech.agent.get(`/api/cook-runs?container=${encodeURIComponent(container)}&${query}`),
        runPageSchema,
      ).items.map((r) => r.id);
    expect(await ids('belowTarget=true')).toEqual([short.id]);
    expect(await ids('belowTarget=false')).toEqual([good.id]);
    expect(await ids('lowLethality=true')).toEqual([short.id]);
  });

  it('leaves a run unjudged when its container has no minimum', async () => {
    const res = await create(tech, newRun({ minutesAtPressure: 5, container: uniqueName('crate') }));
    expect(res.body).toMatchObject({ judgedBy: 'unjudged', minimumMinutes: null, belowTarget: false });
  });

  it('computes F0 from an uploaded log (text/csv, BOM, CRLF, any header case) and stores every reading', async () => {
    const run = await createdRun(tech, newRun());
    const res = await postLog(tech, run.id, '\uFEFF' + cycleCsv('Minute,Temp_C', '\r\n'));
    expect(res.status).toBe(200);
    expect(runOf(res).f0).toBeCloseTo(12.239, 3);
    expect(runOf(res).f0Source).toBe('log');
    expect(runOf(res).f0Label).toBe('from temperature log');
    expect(runOf(res).readingsCount).toBe(21);
    // A log of unstated placement counts as a chamber log: an upper bound that cannot fail or pass on F0.
    expect(res.body).toMatchObject({ logPlacement: 'chamber', judgedBy: 'minutes', f0UpperBound: true });
    expect(runOf(res).belowTarget).toBe(false);
    const readings = bodyOf(await tech.agent.get(`/api/cook-runs/${run.id}/readings`), cookRunReadingsSchema);
    expect(readings.readings).toHaveLength(21);
    // L(115) = 0.24547 and L(121.0) = 0.97724 — TRADE.md §3 [COMP], same sources as above.
    expect(readings.readings[3]).toMatchObject({ minute: 3, celsius: 115 });
    expect(readings.readings[3]!.lethalRate).toBeCloseTo(0.24547, 5);
    expect(readings.readings[6]!.lethalRate).toBeCloseTo(0.97724, 5);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'cook-run',
      recordId: String(run.id),
      action: 'readings',
      field: 'f0',
    });
    expect(Number(audit?.newValue)).toBeCloseTo(12.239, 3);
  });

  it('holds a jar-centre log to the F0 target and refuses an unknown placement', async () => {
    const run = await createdRun(tech, newRun());
    const res = await postCsvAs(tech, `/api/cook-runs/${run.id}/readings?placement=centre`, cycleCsv('minute,celsius'));
    expect(res.status).toBe(200);
    // F0 12.239 from the cycle of TRADE.md §3 [COMP] is below the default target of 15.
    expect(res.body).toMatchObject({ logPlacement: 'centre', judgedBy: 'centre-probe', f0UpperBound: false });
    expect(runOf(res).belowTarget).toBe(true);
    const bad = await postCsvAs(tech, `/api/cook-runs/${run.id}/readings?placement=lid`, cycleCsv('minute,celsius'));
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('placement');
  });

  it('accepts the multipart field file and replaces an earlier log', async () => {
    const run = await createdRun(tech, newRun());
    const post = (body: string) =>
      tech.agent
        .post(`/api/cook-runs/${run.id}/readings`)
        .set('X-CSRF-Token', tech.token())
        .attach('file', Buffer.from(body, 'utf8'), { filename: 'log.csv', contentType: 'text/csv' });
    expect(runOf(await post(cycleCsv('elapsed_min,temperature'))).readingsCount).toBe(21);
    // 15 min at 121.1 °C is F0 = 15 by definition (same sources); three samples 0, 7.5, 15 hold it for 22.5 min by the rectangle rule.
    const second = await post('minutes,celsius\n0,121.1\n7.5,121.1\n15,121.1\n');
    expect(second.status).toBe(200);
    expect(runOf(second).readingsCount).toBe(3);
    expect(runOf(second).f0).toBeCloseTo(22.5, 9);
    expect(await dataSource.manager.countBy(CookRunReading, { cookRunId: run.id })).toBe(3);
  });

  it('answers 422 with every bad line and stores nothing', async () => {
    const run = await createdRun(tech, newRun());
    const res = await postLog(tech, run.id, 'minute,celsius\n0,100\n\n1,hot\n1,120\n3,999\n');
    expect(res.status).toBe(422);
    const messages = errorOf(res).issues!.map((i) => `${i.path}|${i.message}`);
    expect(messages).toEqual([
      'file|line 4, celsius: must be a temperature in °C (got "hot")',
      'file|line 5, minute: must be later than the row before (1)',
      'file|line 6, celsius: must be between -50 and 200 °C',
    ]);
    const detail = await tech.agent.get(`/api/cook-runs/${run.id}`);
    expect(detail.body).toMatchObject({ readingsCount: 0, f0Source: 'estimate', f0: run.f0 });
  });

  it('answers 422 on line 1 when a column is missing and 400 naming file when no log is sent', async () => {
    const run = await createdRun(tech, newRun());
    const res = await postLog(tech, run.id, 'time,celsius\n0,100\n1,101\n');
    expect(res.status).toBe(422);
    expect(errorOf(res).issues![0]!.message).toMatch(/^line 1, minute: no elapsed-minutes column/);
    const empty = await sendAs(tech, 'post', `/api/cook-runs/${run.id}/readings`, {});
    expect(empty.status).toBe(400);
    expect(issuePath(empty)).toBe('file');
  });

  it('removes a log and falls back to the estimate', async () => {
    const run = await createdRun(tech, newRun());
    await postLog(tech, run.id, cycleCsv('minute,celsius')).expect(200);
    const res = await sendAs(tech, 'delete', `/api/cook-runs/${run.id}/readings`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ f0Source: 'estimate', readingsCount: 0 });
    expect(runOf(res).f0).toBeCloseTo(run.f0!, 9);
  });
});
