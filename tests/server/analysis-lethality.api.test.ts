import { beforeAll, describe, expect, it } from 'vitest';
import type { LethalityDto } from '../../shared/schemas/analysis-lethality';
import { psiToKPa } from '../../shared/stats/steam';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { insertCookRun } from './analysis-rows.fixtures';
import { clearProduction } from './analysis-planted.fixture';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  await clearProduction();
  reader = await signedIn(app, 'trainer');
});

describe('GET /api/analysis/lethality', () => {
  beforeAll(async () => {
    // TRADE.md §3 [COMP]: the 1-min cycle 100…121×10…100 °C gives F0 = 12.239 by the rectangle sum.
    const jar = { container: '1 L jar' };
    await insertCookRun('PX-L-LOG', 10, {
      f0: 12.239,
      f0Source: 'log',
      logPlacement: 'centre',
      gaugeKPa: psiToKPa(15),
    });
    await insertCookRun('PX-L-SEA', 90, { gaugeKPa: psiToKPa(15), ...jar });
    await insertCookRun('PX-L-ALT', 90, { gaugeKPa: psiToKPa(15), altitudeM: 1500, ...jar });
    await insertCookRun('PX-L-NOGAUGE', 10);
    // A chamber log with a high F0 on a short cycle: the centre of the jars lagged behind it.
    await insertCookRun('PX-L-CHAMBER', 45, { f0: 41.9, f0Source: 'log', logPlacement: 'chamber', ...jar });
    await insertCookRun('PX-L-BAG', 120, { gaugeKPa: psiToKPa(15), container: '3 KG bag ' });
  });

  it('holds only a jar-centre log to the F0 target and judges the rest by minutes per container', async () => {
    // DESIGN §4.6; container minimums 1 L jar 90 min, 3 kg bag 150 min at about 103 kPa (TRADE.md §1, common practice).
    const body = (await reader.agent.get('/api/analysis/lethality')).body as LethalityDto;
    const run = (code: string) => body.runs.find((r) => r.cookRun === code)!;
    expect(body.containerMinutes).toEqual({ '1 L jar': 90, '2 L jar': 120, '3 kg bag': 150 });
    expect(run('PX-L-LOG')).toMatchObject({ judgedBy: 'centre-probe', f0UpperBound: false, belowTarget: true });
    expect(run('PX-L-CHAMBER')).toMatchObject({
      judgedBy: 'minutes',
      minimumMinutes: 90,
      f0UpperBound: true,
      belowTarget: true,
    });
    expect(run('PX-L-SEA')).toMatchObject({ judgedBy: 'minutes', f0UpperBound: true, belowTarget: false });
    expect(run('PX-L-BAG')).toMatchObject({ judgedBy: 'minutes', minimumMinutes: 150, belowTarget: true });
    expect(run('PX-L-NOGAUGE')).toMatchObject({ judgedBy: 'unjudged', minimumMinutes: null, belowTarget: false });
  });

  it('shows F0 from the log or estimated from steam at the run’s pressure, flagged against the target', async () => {
    const res = await reader.agent.get('/api/analysis/lethality');
    expect(res.status).toBe(200);
    const body = res.body as LethalityDto;
    expect(body.target).toBe(15);
    const run = (code: string) => body.runs.find((r) => r.cookRun === code)!;
    expect(run('PX-L-LOG')).toMatchObject({ f0: 12.239, f0Source: 'log', logPlacement: 'centre', assumedGauge: false });
    // TRADE.md §3 [COMP] from IAPWS-IF97 and ISO 2533: 15 psig → 120.95 °C at sea level (F0 ≈ 87 for 90 min),
    // 118.3 °C at 1,500 m (F0 ≈ 47).
    expect(run('PX-L-SEA').f0).toBeCloseTo(90 * 10 ** ((120.95 - 121.1) / 10), 0);
    expect(run('PX-L-SEA').f0Source).toBe('estimate');
    expect(Math.round(run('PX-L-ALT').f0!)).toBe(47);
    expect(run('PX-L-ALT').belowTarget).toBe(false);
    const noGauge = run('PX-L-NOGAUGE');
    expect(noGauge).toMatchObject({ assumedGauge: true, f0Source: 'estimate' });
    expect(noGauge.f0).toBeCloseTo(10 * 10 ** ((120.95 - 121.1) / 10), 1);
  });

  it('pages the runs, counting those below target over the whole period, and filters to them', async () => {
    const whole = (await reader.agent.get('/api/analysis/lethality?pageSize=200')).body as LethalityDto;
    expect(whole).toMatchObject({ total: 6, page: 1, pageSize: 200, runsInPeriod: 6, belowTarget: 3, only: 'all' });
    const second = (await reader.agent.get('/api/analysis/lethality?page=2&pageSize=4')).body as LethalityDto;
    expect(second).toMatchObject({ total: 6, page: 2, pageSize: 4, runsInPeriod: 6, belowTarget: 3 });
    expect(second.runs).toEqual(whole.runs.slice(4, 6));
    const below = (await reader.agent.get('/api/analysis/lethality?only=below')).body as LethalityDto;
    expect(below).toMatchObject({ total: 3, runsInPeriod: 6, belowTarget: 3, only: 'below' });
    expect(below.runs.map((r) => r.cookRun).sort()).toEqual(['PX-L-BAG', 'PX-L-CHAMBER', 'PX-L-LOG']);
    const bad = await reader.agent.get('/api/analysis/lethality?only=worst');
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body)).toContain('only');
  });

  it('exports the runs as CSV', async () => {
    // Every run, whatever page size is asked for: the export is the whole answer.
    const res = await reader.agent.get('/api/analysis/lethality?format=csv&pageSize=2');
    expect(res.status).toBe(200);
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toMatch(/^cook_run,cooked_on,container,minutes_at_pressure/);
    expect(lines).toHaveLength(1 + 6);
  });
});
