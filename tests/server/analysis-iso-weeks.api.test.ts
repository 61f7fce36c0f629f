import { beforeAll, describe, expect, it } from 'vitest';
import type { RatesDto } from '../../shared/schemas/analysis-rates';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { clearProduction, historyCsv, type HistoryJar } from './analysis-planted.fixture';

const app = createTestApp();
let reader: Awaited<ReturnType<typeof signedIn>>;

beforeAll(async () => {
  await clearProduction();
  reader = await signedIn(app, 'trainer');
});

describe('ISO weeks and buckets', () => {
  beforeAll(async () => {
    const supervisor = await signedIn(app, 'supervisor');
    const jar = (label: string, inoculatedOn: string, cookMinutes: number): HistoryJar => ({
      label,
      grain: 'wheat',
      cookRun: `PX-W-CR-${cookMinutes}`,
      cookMinutes,
      inoculatedOn,
      session: `PX-W-S-${inoculatedOn}`,
      operator: 'Ena Solberg',
      culture: 'PX-W-LC',
      contaminant: null,
      foundOn: null,
    });
    const jars = [
      jar('PX-W-1', '2020-12-28', 59),
      jar('PX-W-2', '2021-01-03', 60),
      jar('PX-W-3', '2021-01-04', 89),
      // Past year ends only: the import refuses dates more than a day ahead. 2015 has 53 ISO weeks too.
      jar('PX-W-4', '2015-12-31', 119),
      jar('PX-W-5', '2016-01-01', 120),
      jar('PX-W-6', '2016-01-03', 179),
      jar('PX-W-7', '2016-01-04', 180),
    ];
    const res = await supervisor.agent
      .post('/api/imports/history')
      .set('X-CSRF-Token', supervisor.token())
      .set('Content-Type', 'text/csv')
      .send(historyCsv(jars));
    if (res.status !== 200) throw new Error(`import failed: ${JSON.stringify(res.body).slice(0, 300)}`);
  });

  it('labels weeks by the ISO week-year: 2016-01-01 is 2015-W53 and 2021-01-03 is 2020-W53', async () => {
    // ISO 8601-1:2019 §5.2.4.2 week dates: week 1 holds the year's first Thursday.
    const res = await reader.agent.get('/api/analysis/rates?by=week&from=2015-12-01&to=2021-01-31');
    expect(res.status).toBe(200);
    const rows = (res.body as RatesDto).rows.map((r) => [r.level, r.jars]);
    expect(rows).toEqual([
      ['2015-W53', 3],
      ['2016-W01', 1],
      ['2020-W53', 2],
      ['2021-W01', 1],
    ]);
  });

  it('buckets whole minutes at pressure on the default edges 60, 90, 120, 180', async () => {
    const body = (await reader.agent.get('/api/analysis/rates?by=cookMinutes&from=2015-12-01&to=2021-01-31'))
      .body as RatesDto;
    expect(body.rows.map((r) => [r.level, r.jars])).toEqual([
      ['<60', 1],
      ['60-89', 2],
      ['90-119', 1],
      ['120-179', 2],
      ['180+', 1],
    ]);
  });
});
