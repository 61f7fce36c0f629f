import { beforeAll, describe, expect, it } from 'vitest';
import { jarStatuses, type JarStatus } from '../../shared/enums';
import { dataSource } from '../../server/db/data-source';
import { Jar } from '../../server/jars/jar.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { jarFixtures } from './jars.fixtures';
import { pageOf } from '../../shared/schemas/common';
import { jarRowSchema } from '../../shared/schemas/jars';
import { bodyOf } from '../setup/bodies';

const app = createTestApp();
const jarPageSchema = pageOf(jarRowSchema);
const total = 5000;
const prefix = uniqueName('PG').toUpperCase();
const grainNames = ['rye', 'sorghum', 'millet', 'wheat'];
const rooms = ['Room 1', 'Room 2', 'Room 3'];

interface Planted {
  id: number;
  label: string;
  grain: string;
  grainId: number;
  status: JarStatus;
  room: string;
  shelf: string;
  inoculatedOn: string;
  sessionId: number;
  cookRunId: number;
  cultureId: number;
}

let planted: Planted[] = [];
let client: Awaited<ReturnType<typeof signedIn>>;

const day = (i: number) => new Date(Date.UTC(2026, 0, 1) + (i % 120) * 86_400_000).toISOString().slice(0, 10);
const byId = (a: Planted, b: Planted) => a.id - b.id;
const cmp = (a: string, b: string) => (a < b ? -1 : a > b ? 1 : 0);

beforeAll(async () => {
  client = await signedIn(app, 'technician');
  const sessions = [await jarFixtures.session(), await jarFixtures.session()];
  const cookRuns = [await jarFixtures.cookRun(), await jarFixtures.cookRun()];
  const cultures = [await jarFixtures.culture(), await jarFixtures.culture()];
  const grainIds = await Promise.all(grainNames.map((g) => jarFixtures.grainId(g)));
  const shelfTag = uniqueName('shelf');
  // Invented jars, shuffled so that label order, date order and id order all differ.
  const rows = Array.from({ length: total }, (_, i) => {
    const k = (i * 7919) % total;
    const inoculatedOn = day(k * 31);
    return {
      label: `${prefix}-${String(k).padStart(5, '0')}`,
      grainId: grainIds[k % 4]!,
      sessionId: sessions[k % 2]!.id,
      cookRunId: cookRuns[Math.floor(k / 10) % 2]!.id,
      cultureId: cultures[k % 3 === 0 ? 0 : 1]!.id,
      room: rooms[k % 3]!,
      shelf: `${shelfTag}-${k % 5}`,
      shelfPosition: k,
      status: jarStatuses[k % 6]!,
      inoculatedAt: new Date(`${inoculatedOn}T10:00:00Z`),
      inoculatedOn,
    };
  });
  for (let i = 0; i < rows.length; i += 1000) {
    await dataSource
      .createQueryBuilder()
      .insert()
      .into(Jar)
      .values(rows.slice(i, i + 1000))
      .execute();
  }
  const stored = await dataSource.manager
    .createQueryBuilder(Jar, 'j')
    .where('j.label LIKE :p', { p: `${prefix}-%` })
    .getMany();
  planted = stored.map((j) => ({
    id: j.id,
    label: j.label,
    grainId: j.grainId,
    grain: grainNames[grainIds.indexOf(j.grainId)]!,
    status: j.status,
    room: j.room!,
    shelf: j.shelf!,
    inoculatedOn: j.inoculatedOn,
    sessionId: j.sessionId!,
    cookRunId: j.cookRunId!,
    cultureId: j.cultureId!,
  }));
}, 120_000);

async function page(query: string) {
  const res = await client.agent.get(`/api/jars?q=${prefix}&${query}`);
  if (res.status !== 200) throw new Error(`${query}: ${res.status} ${JSON.stringify(res.body)}`);
  return bodyOf(res, jarPageSchema);
}

describe('GET /api/jars over 5,000 jars', () => {
  it('has all 5,000 planted jars to page through', () => {
    expect(planted).toHaveLength(total);
  });

  it('pages with the default and the largest page size, and an empty page past the end', async () => {
    const first = await page('');
    expect(first).toMatchObject({ total, page: 1, pageSize: 25 });
    expect(first.items).toHaveLength(25);
    const last = await page('pageSize=200&page=25');
    expect(last.items).toHaveLength(200);
    expect(last.items.at(-1)!.label).toBe(`${prefix}-04999`);
    expect((await page('pageSize=200&page=26')).items).toHaveLength(0);
    const odd = await page('pageSize=7&page=715');
    expect(odd.items).toHaveLength(5000 - 7 * 714);
  });

  it('sorts by label both ways', async () => {
    expect((await page('sort=label&pageSize=3')).items.map((j) => j.label)).toEqual([
      `${prefix}-00000`,
      `${prefix}-00001`,
      `${prefix}-00002`,
    ]);
    expect((await page('sort=-label&pageSize=2')).items.map((j) => j.label)).toEqual([
      `${prefix}-04999`,
      `${prefix}-04998`,
    ]);
  });

  it('sorts by inoculation date with a stable tie-break, so consecutive pages neither repeat nor skip', async () => {
    const expected = [...planted]
      .sort((a, b) => cmp(a.inoculatedOn, b.inoculatedOn) || byId(a, b))
      .slice(0, 600)
      .map((j) => j.id);
    const got: number[] = [];
    for (let p = 1; p <= 3; p += 1)
      got.push(...(await page(`sort=inoculatedOn&pageSize=200&page=${p}`)).items.map((j) => j.id));
    expect(got).toEqual(expected);
    const desc = [...planted]
      .sort((a, b) => cmp(b.inoculatedOn, a.inoculatedOn) || byId(b, a))
      .slice(0, 50)
      .map((j) => j.id);
    expect((await page('sort=-inoculatedOn&pageSize=50')).items.map((j) => j.id)).toEqual(desc);
  });

  it('sorts by grain name and by status in life-cycle order', async () => {
    const grain = [...planted].sort((a, b) => cmp(a.grain, b.grain) || byId(a, b));
    expect((await page('sort=grain&pageSize=200&page=7')).items.map((j) => j.id)).toEqual(
      grain.slice(1200, 1400).map((j) => j.id),
    );
    // Status sorts in the order of the status list (incubating … released), not alphabetically.
    const status = [...planted].sort(
      (a, b) => jarStatuses.indexOf(b.status) - jarStatuses.indexOf(a.status) || byId(b, a),
    );
    expect((await page('sort=-status&pageSize=100&page=9')).items.map((j) => j.id)).toEqual(
      status.slice(800, 900).map((j) => j.id),
    );
    const room = [...planted].sort((a, b) => cmp(a.room, b.room) || byId(a, b));
    expect((await page('sort=room&pageSize=100&page=20')).items.map((j) => j.id)).toEqual(
      room.slice(1900, 2000).map((j) => j.id),
    );
  });

  it('filters on the server, alone and combined', async () => {
    const j0 = planted[0]!;
    const filters: [string, (j: Planted) => boolean][] = [
      ['status=colonised,on-hold', (j) => j.status === 'colonised' || j.status === 'on-hold'],
      [`grainId=${j0.grainId}`, (j) => j.grainId === j0.grainId],
      [`cookRunId=${j0.cookRunId}`, (j) => j.cookRunId === j0.cookRunId],
      [`sessionId=${j0.sessionId}`, (j) => j.sessionId === j0.sessionId],
      [`cultureId=${j0.cultureId}`, (j) => j.cultureId === j0.cultureId],
      ['room=Room 2', (j) => j.room === 'Room 2'],
      [`room=${j0.room}&shelf=${j0.shelf}`, (j) => j.room === j0.room && j.shelf === j0.shelf],
      ['from=2026-02-01&to=2026-02-28', (j) => j.inoculatedOn >= '2026-02-01' && j.inoculatedOn <= '2026-02-28'],
      [
        `status=incubating&grainId=${j0.grainId}&from=2026-03-01`,
        (j) => j.status === 'incubating' && j.grainId === j0.grainId && j.inoculatedOn >= '2026-03-01',
      ],
    ];
    const want = [];
    const got = [];
    for (const [query, keep] of filters) {
      const expected = planted.filter(keep).sort((a, b) => cmp(a.label, b.label));
      const res = await page(`${query}&pageSize=200&sort=label`);
      want.push({ query, total: expected.length, ids: expected.slice(0, 200).map((j) => j.id) });
      got.push({ query, total: res.total, ids: res.items.map((j) => j.id) });
    }
    expect(want.every((w) => w.total > 0)).toBe(true);
    expect(got).toEqual(want);
    const q = await client.agent.get(`/api/jars?q=${prefix}-0499`);
    expect(bodyOf(q, jarPageSchema).total).toBe(10);
  });

  it('exports every filtered jar, not just one page', async () => {
    const res = await client.agent.get(`/api/jars/export.csv?q=${prefix}&room=Room 1`);
    expect(res.status).toBe(200);
    const lines = res.text.trim().split('\r\n');
    expect(lines.length - 1).toBe(planted.filter((j) => j.room === 'Room 1').length);
  });
});
