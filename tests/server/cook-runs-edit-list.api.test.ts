import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { sendAs, signedIn, uniqueName, type Client } from '../setup/factories';
import { create, createdRun, newRun, runOf, runPageSchema } from './cook-runs.fixtures';
import { bodyOf } from '../setup/bodies';

const app = createTestApp();

let tech: Client;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
});

describe('/api/cook-runs editing, listing and export', () => {
  it('audits each changed field with its old and new value and re-estimates F0', async () => {
    const run = await createdRun(tech, newRun());
    const res = await sendAs(tech, 'patch', `/api/cook-runs/${run.id}`, {
      minutesAtPressure: 120,
      vessel: 'Cooker B',
      reason: 'gauge log re-read',
    });
    expect(res.status).toBe(200);
    expect(runOf(res).minutesAtPressure).toBe(120);
    expect(runOf(res).f0).toBeCloseTo((run.f0! / 90) * 120, 6);
    const events = await dataSource.manager.findBy(AuditEvent, {
      recordType: 'cook-run',
      recordId: String(run.id),
      action: 'update',
    });
    const byField = Object.fromEntries(events.map((e) => [String(e.field), e] as const));
    expect(byField.minutesAtPressure).toMatchObject({ oldValue: '90', newValue: '120', reason: 'gauge log re-read' });
    expect(byField.vessel).toMatchObject({ oldValue: 'Cooker A', newValue: 'Cooker B' });
    expect(byField.f0).toBeDefined();
    expect(byField.loadCount).toBeUndefined();
  });

  it('takes the run date from the start time in the lab time zone (Europe/London)', async () => {
    const res = await create(tech, newRun({ cookedOn: undefined, startedAt: '2026-06-30T23:30:00Z' }));
    expect(res.status).toBe(201);
    expect(runOf(res).cookedOn).toBe('2026-07-01');
    expect(runOf(res).startedAt).toBe('2026-06-30T23:30:00.000Z');
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
    expect(bodyOf(page1, runPageSchema).items.map((r) => r.minutesAtPressure)).toEqual([150, 90]);
    const page2 = await tech.agent.get(`/api/cook-runs?container=${c}&sort=-minutesAtPressure&pageSize=2&page=2`);
    expect(bodyOf(page2, runPageSchema).items.map((r) => r.minutesAtPressure)).toEqual([60]);
    const ranged = await tech.agent.get(`/api/cook-runs?container=${c}&from=2026-01-06&to=2026-01-07&sort=cookedOn`);
    expect(bodyOf(ranged, runPageSchema).items.map((r) => r.cookedOn)).toEqual(['2026-01-06', '2026-01-07']);
    const byF0 = await tech.agent.get(`/api/cook-runs?container=${c}&sort=f0`);
    expect(bodyOf(byF0, runPageSchema).items.map((r) => r.minutesAtPressure)).toEqual([60, 90, 150]);
  });

  it('exports every matching run as CSV', async () => {
    const container = uniqueName('3kg');
    const a = await createdRun(tech, newRun({ container, notes: 'first, with a comma' }));
    const b = await createdRun(tech, newRun({ container }));
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
