import { beforeAll, describe, expect, it } from 'vitest';
import { COUNT_CAP, cappedTotal } from '../../server/core/paging';
import { dataSource } from '../../server/db/data-source';
import { Jar } from '../../server/jars/jar.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { jarFixtures } from './jars.fixtures';
import { pageOf } from '../../shared/schemas/common';
import { jarRowSchema } from '../../shared/schemas/jars';
import { bodyOf } from '../setup/bodies';

const app = createTestApp();
const planted = COUNT_CAP + 1;
const prefix = uniqueName('CAP').toUpperCase();
let client: Awaited<ReturnType<typeof signedIn>>;

const digit =
  '(SELECT 0 d UNION ALL SELECT 1 UNION ALL SELECT 2 UNION ALL SELECT 3 UNION ALL SELECT 4 UNION ALL SELECT 5 UNION ALL SELECT 6 UNION ALL SELECT 7 UNION ALL SELECT 8 UNION ALL SELECT 9)';

beforeAll(async () => {
  client = await signedIn(app, 'technician');
  // One more jar than the cap, in one statement: labels PREFIX-00000 … PREFIX-10000.
  await dataSource.query(
    `INSERT INTO jars (label, grainId, status, inoculatedAt, inoculatedOn)
     SELECT CONCAT(?, '-', LPAD(n, 5, '0')), ?, 'incubating', '2026-01-05 10:00:00', '2026-01-05'
     FROM (SELECT a.d + 10 * b.d + 100 * c.d + 1000 * e.d + 10000 * f.d AS n
           FROM ${digit} a, ${digit} b, ${digit} c, ${digit} e, ${digit} f) nums
     WHERE n < ?`,
    [prefix, await jarFixtures.grainId('rye'), planted],
  );
}, 120_000);

describe('register totals past the count cap', () => {
  it('counts exactly up to the cap and says when it stopped counting', async () => {
    const mine = () => dataSource.manager.createQueryBuilder(Jar, 'j').where('j.label LIKE :p', { p: `${prefix}-%` });
    expect(await cappedTotal(mine(), planted)).toEqual({ total: planted, totalCapped: false });
    expect(await cappedTotal(mine(), planted - 1)).toEqual({ total: planted - 1, totalCapped: true });
    expect(await cappedTotal(mine(), 100)).toEqual({ total: 100, totalCapped: true });
    expect(await cappedTotal(mine().andWhere("j.label LIKE '%-0000_'"))).toEqual({ total: 10, totalCapped: false });
  });

  it('answers the jar register with the cap as its total, marked as cut, and an exact total under it', async () => {
    const over = await client.agent.get(`/api/jars?q=${prefix}`);
    expect(over.status).toBe(200);
    expect(over.body).toMatchObject({ total: COUNT_CAP, totalCapped: true, page: 1, pageSize: 25 });
    expect(bodyOf(over, pageOf(jarRowSchema)).items).toHaveLength(25);
    const under = await client.agent.get(`/api/jars?q=${prefix}-0999`);
    expect(under.body).toMatchObject({ total: 10, totalCapped: false });
  });

  it('still pages past the cap, to the last jar', async () => {
    const last = await client.agent.get(`/api/jars?q=${prefix}&sort=label&pageSize=25&page=401`);
    expect(last.status).toBe(200);
    expect(bodyOf(last, pageOf(jarRowSchema)).items.map((j) => j.label)).toEqual([`${prefix}-10000`]);
  });
});
