import { beforeAll, describe, expect, it } from 'vitest';
import type { CrosstabPageDto, RatesPageDto } from '../../shared/schemas/analysis-rates';
import type { JarsBehindDto } from '../../shared/schemas/analysis-jars-behind';
import { dataSource } from '../../server/db/data-source';
import { Jar } from '../../server/jars/jar.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { jarFixtures } from './jars.fixtures';
import { rebuildTallies } from '../../server/tallies/tallies.service';

const app = createTestApp();
// A month no other test plants in, so the period holds these jars alone.
const period = 'from=2011-03-01&to=2011-03-31';
let client: Awaited<ReturnType<typeof signedIn>>;
let prefix: string;
let sessionCodes: string[];

beforeAll(async () => {
  client = await signedIn(app, 'supervisor');
  const grains = [await jarFixtures.grainId('rye'), await jarFixtures.grainId('millet')];
  const sessions = [];
  for (const day of ['2011-03-02', '2011-03-03', '2011-03-04']) sessions.push(await jarFixtures.session(day));
  prefix = uniqueName('LP').toUpperCase();
  sessionCodes = sessions.map((x) => x.code);
  // Two jars per session, one on each grain.
  await dataSource.manager.insert(
    Jar,
    sessions.flatMap((s, i) =>
      grains.map((grainId, g) => ({
        label: `${prefix}-${i}${g}`,
        grainId,
        sessionId: s.id,
        status: 'colonised' as const,
        inoculatedAt: new Date(`${s.heldOn}T10:00:00Z`),
        inoculatedOn: s.heldOn,
      })),
    ),
  );
  await rebuildTallies();
});

describe('analysis answers a page of levels', () => {
  it('pages rates by session, the overall figures still over every jar', async () => {
    // A JSON answer is always a page: without one asked for, the first page of 25.
    const whole = (await client.agent.get(`/api/analysis/rates?by=session&${period}`)).body as RatesPageDto;
    expect(whole).toMatchObject({ total: 3, page: 1, pageSize: 25 });
    expect(whole.rows).toHaveLength(3);
    const res = await client.agent.get(`/api/analysis/rates?by=session&${period}&page=2&pageSize=1`);
    expect(res.status).toBe(200);
    const paged = res.body as RatesPageDto;
    expect(paged).toMatchObject({ total: 3, page: 2, pageSize: 1 });
    expect(paged.rows).toEqual(whole.rows.slice(1, 2));
    expect(paged.overall).toEqual(whole.overall);
    expect(paged.overall.jars).toBe(6);
  });

  it('windows a crosstab on both axes and keeps only the cells inside', async () => {
    const whole = (await client.agent.get(`/api/analysis/crosstab?rows=session&cols=grain&${period}`))
      .body as CrosstabPageDto;
    expect(whole.rowPage).toEqual({ total: 3, page: 1, pageSize: 25 });
    expect(whole.colPage).toEqual({ total: 2, page: 1, pageSize: 20 });
    expect(whole.cells).toHaveLength(6);
    const res = await client.agent.get(
      `/api/analysis/crosstab?rows=session&cols=grain&${period}&page=1&pageSize=2&colPage=2&colPageSize=1`,
    );
    expect(res.status).toBe(200);
    const window = res.body as CrosstabPageDto;
    expect(window.rowPage).toEqual({ total: 3, page: 1, pageSize: 2 });
    expect(window.colPage).toEqual({ total: 2, page: 2, pageSize: 1 });
    expect(window.rows).toEqual(whole.rows.slice(0, 2));
    expect(window.cols).toEqual(whole.cols.slice(1, 2));
    expect(window.cells).toEqual(whole.cells.filter((c) => window.rows.includes(c.row) && window.cols.includes(c.col)));
    expect(window.cells).toHaveLength(2);
  });

  it('caps a JSON answer at its page size even when no page is asked for; the CSV holds every level', async () => {
    const capped = (await client.agent.get(`/api/analysis/rates?by=session&${period}&pageSize=2`)).body as RatesPageDto;
    expect(capped).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    expect(capped.rows).toHaveLength(2);
    const crosstab = (await client.agent.get(`/api/analysis/crosstab?rows=session&cols=grain&${period}&pageSize=1`))
      .body as CrosstabPageDto;
    expect(crosstab.rows).toHaveLength(1);
    expect(crosstab.cells).toHaveLength(2);
    const file = await client.agent.get(`/api/analysis/rates?by=session&${period}&pageSize=2&page=1&format=csv`);
    expect(file.status).toBe(200);
    // A header, one line per session and the all-jars line: the export ignores paging.
    expect(
      file.text
        .replace(/^\uFEFF/, '')
        .trim()
        .split('\r\n'),
    ).toHaveLength(1 + 3 + 1);
  });

  it('lists the jars behind a week and grain, a session or a room, day by day and a page at a time', async () => {
    const behind = async (query: string) => {
      const res = await client.agent.get(`/api/analysis/jars?${query}&${period}`);
      expect(res.status).toBe(200);
      return res.body as JarsBehindDto;
    };
    // 2 March 2011 is a Wednesday of ISO week 2011-W09 (28 February – 6 March), as are the next two days.
    const rye = await behind('factor=week&level=2011-W09&factor2=grain&level2=rye');
    expect(rye.total).toBe(3);
    expect(rye.items.map((j) => j.label)).toEqual([`${prefix}-00`, `${prefix}-10`, `${prefix}-20`]);
    expect(rye.items.map((j) => j.inoculatedOn)).toEqual(['2011-03-02', '2011-03-03', '2011-03-04']);
    expect((await behind('factor=week&level=2011-W10')).total).toBe(0);
    const session = await behind(`factor=session&level=${sessionCodes[1]}&pageSize=1&page=2`);
    expect(session).toMatchObject({ total: 2, page: 2, pageSize: 1 });
    expect(session.items.map((j) => j.label)).toEqual([`${prefix}-11`]);
    // The planted jars record no room: no level names them.
    expect((await behind('factor=room&level=Incubation%20A')).total).toBe(0);
  });

  it('refuses a page size past the most a screen asks for, naming the field', async () => {
    const res = await client.agent.get(`/api/analysis/rates?by=session&${period}&page=1&pageSize=500`);
    expect(res.status).toBe(400);
    expect(JSON.stringify(res.body)).toContain('pageSize');
  });
});
