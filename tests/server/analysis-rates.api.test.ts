import { beforeAll, describe, expect, it } from 'vitest';
import type { CrosstabDto, RatesDto } from '../../shared/schemas/analysis-rates';
import { wilsonInterval } from '../../shared/stats/wilson';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { addDays, planted } from './analysis-planted.fixture';
import { all, bucket, countBy, levelOf, plantHistory, RECENT_CLEAN } from './analysis.fixtures';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  ({ reader } = await plantHistory(app));
});

describe('GET /api/analysis/rates', () => {
  it.each(['grain', 'cookRun', 'cookMinutes', 'operator', 'culture', 'week'] as const)(
    'counts jars, contaminated and incubating by %s exactly, with Wilson intervals',
    async (by) => {
      const res = await reader.agent.get(`/api/analysis/rates?by=${by}`);
      expect(res.status).toBe(200);
      const body = res.body as RatesDto;
      const expected = countBy(all, levelOf[by]!);
      expect(body.by).toBe(by);
      expect(
        Object.fromEntries(
          body.rows.map((r) => [r.level, { jars: r.jars, contaminated: r.contaminated, incubating: r.incubating }]),
        ),
      ).toEqual(Object.fromEntries(expected));
      expect(body.overall).toMatchObject({
        jars: all.length,
        contaminated: all.filter((j) => j.contaminant).length,
        incubating: RECENT_CLEAN,
      });
      for (const r of [...body.rows, body.overall]) {
        expect(r.rate).toBe(r.contaminated / r.jars);
        // Wilson score interval, z = 1.959963984540054 — Newcombe, Statistics in Medicine 17:857–872 (1998), method 3.
        const [lo, hi] = wilsonInterval(r.contaminated, r.jars);
        expect(Math.abs(r.ci95[0] - lo)).toBeLessThan(1e-12);
        expect(Math.abs(r.ci95[1] - hi)).toBeLessThan(1e-12);
        expect(Number.isInteger(r.jars) && Number.isInteger(r.contaminated) && Number.isInteger(r.incubating)).toBe(
          true,
        );
      }
    },
  );

  it('labels cook-duration buckets from the default edges', async () => {
    const body = (await reader.agent.get('/api/analysis/rates?by=cookMinutes')).body as RatesDto;
    expect(body.rows.map((r) => r.level)).toEqual(['<60', '90-119']);
    const short = body.rows.find((r) => r.level === '<60')!;
    expect(short.jars).toBe(all.filter((j) => j.cookMinutes < 60).length);
  });

  it('limits the period to jars inoculated from..to inclusive', async () => {
    const from = addDays(planted.firstMonday, 1);
    const to = addDays(planted.firstMonday, 8);
    const body = (await reader.agent.get(`/api/analysis/rates?by=grain&from=${from}&to=${to}`)).body as RatesDto;
    const inside = all.filter((j) => j.inoculatedOn >= from && j.inoculatedOn <= to);
    expect(body.overall.jars).toBe(inside.length);
    expect(body.overall.jars).toBe(3 * 4 * 12 + 12);
  });

  it('leaves factors the history does not record out of the rows and says how many jars lack them', async () => {
    const body = (await reader.agent.get('/api/analysis/rates?by=room')).body as RatesDto;
    expect(body.rows).toEqual([]);
    expect(body.notRecorded).toBe(all.length);
    expect(body.overall.jars).toBe(all.length);
  });

  it('exports the table as CSV', async () => {
    const res = await reader.agent.get('/api/analysis/rates?by=culture&format=csv');
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe('level,jars,contaminated,incubating,rate,ci95_low,ci95_high');
    expect(lines).toHaveLength(1 + 4 + 1);
  });
});

describe('GET /api/analysis/crosstab', () => {
  it('counts every grain × cook-duration cell exactly', async () => {
    const res = await reader.agent.get('/api/analysis/crosstab?rows=grain&cols=cookMinutes');
    expect(res.status).toBe(200);
    const body = res.body as CrosstabDto;
    const expected = countBy(all, (j) => `${j.grain}|${bucket(j.cookMinutes)}`);
    expect(body.cells).toHaveLength(expected.size);
    for (const cell of body.cells) {
      const e = expected.get(`${cell.row}|${cell.col}`)!;
      expect({ jars: cell.jars, contaminated: cell.contaminated, incubating: cell.incubating }).toEqual(e);
      const [lo, hi] = wilsonInterval(cell.contaminated, cell.jars);
      expect(Math.abs(cell.ci95[0] - lo)).toBeLessThan(1e-12);
      expect(Math.abs(cell.ci95[1] - hi)).toBeLessThan(1e-12);
    }
    expect(body.cols).toEqual(['<60', '90-119']);
    expect([...body.rows].sort()).toEqual(['millet', 'rye', 'sorghum']);
  });
});
