import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { Jar } from '../../server/jars/jar.entity';
import { jarBatchResultSchema } from '../../shared/schemas/jars';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { batchBody, jarEvent, jarFixtures, labelNumber, labelPrefix, makeJars } from './jars.fixtures';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();

describe('POST /api/jars/batch', () => {
  it('makes jars with labels in sequence, shelf places in order and an audit event each', async () => {
    const tech = await signedIn(app, 'technician');
    const body = await batchBody({ count: 12, room: 'Incubation A', shelf: `S-${Date.now()}`, inoculumMl: 2 });
    const res = await tech.agent.post('/api/jars/batch').set('X-CSRF-Token', tech.token()).send(body);
    expect(res.status).toBe(201);
    const { jars } = bodyOf(res, jarBatchResultSchema);
    expect(jars).toHaveLength(12);
    const first = labelNumber(jars[0]!.label);
    // The format follows the lab's latest numbered label (jar-labels.api.test.ts checks that rule).
    const prefix = labelPrefix(jars[0]!.label);
    const width = jars[0]!.label.length - prefix.length;
    expect(jars.map((j) => j.label)).toEqual(
      jars.map((_, i) => `${prefix}${String(first + BigInt(i)).padStart(width, '0')}`),
    );
    expect(jars.map((j) => j.shelfPosition)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expect(jars.every((j) => j.status === 'incubating' && j.inoculumMl === 2)).toBe(true);
    const audits = await dataSource.manager.countBy(AuditEvent, {
      recordType: 'jar',
      action: 'create',
      userName: 'Test technician',
      recordId: String(jars[5]!.id),
    });
    expect(audits).toBe(1);

    // A second batch on the same shelf continues the shelf order.
    const more = await makeJars(tech, { ...body, count: 2 });
    expect(more.map((j) => j.shelfPosition)).toEqual([13, 14]);
    expect(labelNumber(more[0]!.label)).toBe(first + 12n);
  });

  it('never hands out one label twice when two batches are made at the same moment', async () => {
    const tech = await signedIn(app, 'technician');
    const bodies = await Promise.all([batchBody({ count: 20 }), batchBody({ count: 20 })]);
    const [a, b] = await Promise.all(bodies.map((body) => makeJars(tech, body)));
    const numbers = [...a!, ...b!].map((j) => labelNumber(j.label)).sort((x, y) => (x < y ? -1 : x > y ? 1 : 0));
    expect(new Set(numbers).size).toBe(40);
    expect(numbers.at(-1)! - numbers[0]!).toBe(39n);
  });

  it('dates jars by the local day in the lab time zone', async () => {
    // Europe/London keeps summer time (UTC+1) from the last Sunday of March to the last Sunday of
    // October (EU Directive 2000/84/EC; the UK Summer Time Order 2002), so 23:30 UTC on 30 June is 1 July.
    const tech = await signedIn(app, 'technician');
    const session = await jarFixtures.session('2026-07-01');
    const res = await tech.agent
      .post('/api/jars/batch')
      .set('X-CSRF-Token', tech.token())
      .send(await batchBody({ sessionId: session.id, count: 1, inoculatedAt: '2026-06-30T23:30:00Z' }));
    expect(res.status).toBe(201);
    const made = bodyOf(res, jarBatchResultSchema);
    expect(made.jars[0]!.inoculatedOn).toBe('2026-07-01');
    expect(made.warnings).toEqual([]);
  });

  it('takes the grain from the prep batch and warns about a quarantined culture and a date that is not the session day', async () => {
    const tech = await signedIn(app, 'technician');
    const batch = await jarFixtures.prepBatch('sorghum');
    const culture = await jarFixtures.culture('quarantined');
    const res = await tech.agent
      .post('/api/jars/batch')
      .set('X-CSRF-Token', tech.token())
      .send(
        await batchBody({
          grainId: undefined,
          prepBatchId: batch.id,
          cultureId: culture.id,
          inoculatedAt: '2026-05-06T10:00:00Z',
          count: 2,
        }),
      );
    expect(res.status).toBe(201);
    const made = bodyOf(res, jarBatchResultSchema);
    expect(made.jars[0]).toMatchObject({ grain: 'sorghum', prepBatchCode: batch.code, cultureCode: culture.code });
    expect(made.warnings).toHaveLength(2);
    expect(made.warnings[0]).toContain(`Culture ${culture.code} is quarantined`);
    expect(made.warnings[1]).toContain('2026-05-04');
  });

  it('answers 400 naming the field for a bad body', async () => {
    const tech = await signedIn(app, 'technician');
    const base = await batchBody();
    const cases: [Record<string, unknown>, string][] = [
      [{ ...base, count: 0 }, 'count'],
      [{ ...base, count: 201 }, 'count'],
      [{ ...base, cultureId: undefined }, 'cultureId'],
      [{ ...base, parentJarId: 5 }, 'parentJarId'],
      [{ ...base, grainId: undefined }, 'grainId'],
      [{ ...base, room: 'A' }, 'shelf'],
      [{ ...base, inoculatedAt: 'yesterday' }, 'inoculatedAt'],
      [{ ...base, inoculatedAt: '2099-01-01T00:00:00Z' }, 'inoculatedAt'],
      [{ ...base, sessionId: 'x' }, 'sessionId'],
    ];
    const got = [];
    for (const [body, path] of cases) {
      const res = await tech.agent.post('/api/jars/batch').set('X-CSRF-Token', tech.token()).send(body);
      got.push([path, res.status, issuePath(res)]);
    }
    expect(got).toEqual(cases.map(([, path]) => [path, 400, path]));
  });

  it('answers 422 naming the field for a session, culture or grain that is not recorded, and writes nothing', async () => {
    const tech = await signedIn(app, 'technician');
    const before = await dataSource.manager.count(Jar);
    const fields = ['sessionId', 'cultureId', 'grainId', 'cookRunId', 'prepBatchId', 'parentJarId'];
    const got = [];
    for (const field of fields) {
      const body = await batchBody(
        field === 'parentJarId' ? { cultureId: undefined, parentJarId: 99999999 } : { [field]: 99999999 },
      );
      const res = await tech.agent.post('/api/jars/batch').set('X-CSRF-Token', tech.token()).send(body);
      got.push([field, res.status, issuePath(res)]);
    }
    expect(got).toEqual(fields.map((f) => [f, 422, f]));
    expect(await dataSource.manager.count(Jar)).toBe(before);
  });

  it('refuses a parent jar that is on hold with 409 naming parentJarId', async () => {
    const tech = await signedIn(app, 'technician');
    const [parent] = await makeJars(tech, await batchBody({ count: 1 }));
    await jarEvent(tech, parent!.id, { type: 'hold', reason: 'suspect smell' }).expect(201);
    const res = await tech.agent
      .post('/api/jars/batch')
      .set('X-CSRF-Token', tech.token())
      .send(await batchBody({ cultureId: undefined, parentJarId: parent!.id }));
    expect(res.status).toBe(409);
    expect(issuePath(res)).toBe('parentJarId');
  });
});
