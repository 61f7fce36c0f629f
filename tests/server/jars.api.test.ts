import QRCode from 'qrcode';
import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { Jar } from '../../server/jars/jar.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { jarEvent, jarFixtures, makeJars } from './jars.fixtures';

const app = createTestApp();
// BigInt: another file in this worker may have left a label past 2^53.
const labelNumber = (label: string) => BigInt(/[0-9]+$/.exec(label)?.[0] ?? '0');
const labelPrefix = (label: string) => label.replace(/[0-9]+$/, '');

async function batchBody(overrides: Record<string, unknown> = {}) {
  const session = await jarFixtures.session();
  const culture = await jarFixtures.culture();
  return {
    sessionId: session.id,
    count: 3,
    grainId: await jarFixtures.grainId(),
    cultureId: culture.id,
    inoculatedAt: '2026-05-04T10:30:00Z',
    ...overrides,
  };
}

describe('jar routes: sign-in and roles', () => {
  it.each([
    ['get', '/api/jars'],
    ['get', '/api/jars/export.csv'],
    ['get', '/api/jars/1'],
    ['get', '/api/jars/by-label/J-000001'],
    ['get', '/api/jars/1/qr.svg'],
    ['get', '/api/jars/labels?ids=1'],
    ['get', '/api/jars/shelf?room=A&shelf=1'],
  ] as const)('answers 401 to %s %s without a session', async (_m, url) => {
    expect((await supertest(app).get(url)).status).toBe(401);
  });

  it('answers 401 to writes with a CSRF token but no session', async () => {
    const agent = supertest.agent(app);
    const { token } = (await agent.get('/api/auth/csrf')).body as { token: string };
    for (const url of ['/api/jars/batch', '/api/jars/1/events', '/api/jars/shelf-walk']) {
      expect((await agent.post(url).set('X-CSRF-Token', token).send({})).status).toBe(401);
    }
  });

  it('refuses every jar write to a trainer with 403, but lets them read', async () => {
    const tech = await signedIn(app, 'technician');
    const [jar] = await makeJars(tech, await batchBody({ count: 1 }));
    const trainer = await signedIn(app, 'trainer');
    const t = trainer.token();
    expect(
      (
        await trainer.agent
          .post('/api/jars/batch')
          .set('X-CSRF-Token', t)
          .send(await batchBody())
      ).status,
    ).toBe(403);
    expect(
      (await trainer.agent.post(`/api/jars/${jar!.id}/events`).set('X-CSRF-Token', t).send({ type: 'shaken' })).status,
    ).toBe(403);
    expect(
      (
        await trainer.agent
          .post('/api/jars/shelf-walk')
          .set('X-CSRF-Token', t)
          .send({ marks: [{ jarId: jar!.id, mark: 'clean' }] })
      ).status,
    ).toBe(403);
    expect((await trainer.agent.get(`/api/jars/${jar!.id}`)).status).toBe(200);
  });

  it('answers 404 for an unknown jar id or label', async () => {
    const tech = await signedIn(app, 'technician');
    expect((await tech.agent.get('/api/jars/99999999')).status).toBe(404);
    expect((await tech.agent.get('/api/jars/by-label/NO-SUCH-JAR')).status).toBe(404);
    expect((await tech.agent.get('/api/jars/99999999/qr.svg')).status).toBe(404);
    expect((await jarEvent(tech, 99999999, { type: 'shaken' })).status).toBe(404);
  });

  it('answers 400 naming the field for bad ids, sorts and filters', async () => {
    const tech = await signedIn(app, 'technician');
    const bad = [
      ['/api/jars/abc', 'id'],
      ['/api/jars?sort=colour', 'sort'],
      ['/api/jars?status=mouldy', 'status.0'],
      ['/api/jars?from=2026-13-01', 'from'],
      ['/api/jars?pageSize=201', 'pageSize'],
      ['/api/jars/shelf?room=A', 'shelf'],
      ['/api/jars/labels', 'ids'],
    ] as const;
    const got = [];
    for (const [url] of bad) {
      const res = await tech.agent.get(url);
      got.push([url, res.status, res.body.error.issues[0].path]);
    }
    expect(got).toEqual(bad.map(([url, path]) => [url, 400, path]));
  });
});

describe('POST /api/jars/batch', () => {
  it('makes jars with labels in sequence, shelf places in order and an audit event each', async () => {
    const tech = await signedIn(app, 'technician');
    const body = await batchBody({ count: 12, room: 'Incubation A', shelf: `S-${Date.now()}`, inoculumMl: 2 });
    const res = await tech.agent.post('/api/jars/batch').set('X-CSRF-Token', tech.token()).send(body);
    expect(res.status).toBe(201);
    const jars = res.body.jars as {
      id: number;
      label: string;
      shelfPosition: number;
      status: string;
      inoculumMl: number;
      sessionCode: string;
    }[];
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
    expect(res.body.jars[0].inoculatedOn).toBe('2026-07-01');
    expect(res.body.warnings).toEqual([]);
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
    expect(res.body.jars[0]).toMatchObject({ grain: 'sorghum', prepBatchCode: batch.code, cultureCode: culture.code });
    expect(res.body.warnings).toHaveLength(2);
    expect(res.body.warnings[0]).toContain(`Culture ${culture.code} is quarantined`);
    expect(res.body.warnings[1]).toContain('2026-05-04');
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
      got.push([path, res.status, res.body.error.issues[0].path]);
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
      got.push([field, res.status, res.body.error.issues[0].path]);
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
    expect(res.body.error.issues[0].path).toBe('parentJarId');
  });
});

describe('the jar page, QR code and label sheet', () => {
  it('tells the whole story in time order, with the ancestry up to the culture', async () => {
    const tech = await signedIn(app, 'technician');
    const parentCulture = await jarFixtures.culture();
    const culture = await jarFixtures.culture('released', parentCulture.id);
    const batch = await jarFixtures.prepBatch();
    const cookRun = await jarFixtures.cookRun();
    const [parent] = await makeJars(tech, await batchBody({ count: 1, cultureId: culture.id }));
    await jarEvent(tech, parent!.id, { type: 'colonised', at: '2026-05-16T09:00:00Z' }).expect(201);
    const session = await jarFixtures.session('2026-05-20');
    const [jar] = await makeJars(
      tech,
      await batchBody({
        count: 1,
        sessionId: session.id,
        cultureId: undefined,
        parentJarId: parent!.id,
        prepBatchId: batch.id,
        cookRunId: cookRun.id,
        inoculatedAt: '2026-05-20T11:00:00Z',
      }),
    );
    await jarEvent(tech, jar!.id, { type: 'check', percentColonised: 30, at: '2026-05-25T08:00:00Z' }).expect(201);
    await jarEvent(tech, jar!.id, { type: 'shaken', at: '2026-05-25T08:05:00Z' }).expect(201);

    const res = await tech.agent.get(`/api/jars/by-label/${jar!.label}`);
    expect(res.status).toBe(200);
    expect(res.body.jar).toMatchObject({ id: jar!.id, parentJarLabel: parent!.label, cookRunCode: cookRun.code });
    expect(res.body.ancestry.map((a: { kind: string; label?: string; code?: string }) => a.label ?? a.code)).toEqual([
      parent!.label,
      culture.code,
      parentCulture.code,
    ]);
    expect(res.body.events.map((e: { type: string }) => e.type)).toEqual(['check', 'shaken']);
    expect(res.body.pageUrl).toMatch(new RegExp(`/j/${jar!.label}$`));
    const kinds = (res.body.timeline as { kind: string; at: string }[]).map((t) => t.kind);
    expect(kinds).toEqual([
      'culture',
      'culture',
      'grain-prep',
      'cook-run',
      'culture',
      'session',
      'inoculated',
      'event',
      'event',
    ]);
    const times = (res.body.timeline as { at: string }[]).map((t) =>
      t.at.length === 10 ? `${t.at}T00:00:00.000Z` : t.at,
    );
    expect([...times].sort()).toEqual(times);
    expect((await tech.agent.get(`/api/jars/${jar!.id}`)).body.jar.label).toBe(jar!.label);
  });

  it('draws a QR code that encodes the public jar address', async () => {
    const tech = await signedIn(app, 'technician');
    const [jar] = await makeJars(tech, await batchBody({ count: 1 }));
    const res = await tech.agent
      .get(`/api/jars/${jar!.id}/qr.svg`)
      .buffer(true)
      .parse((r, cb) => {
        let text = '';
        r.on('data', (c: Buffer) => (text += c.toString()));
        r.on('end', () => cb(null, text));
      });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('image/svg+xml');
    const url = `http://127.0.0.1:5180/j/${jar!.label}`;
    expect(res.body).toBe(await QRCode.toString(url, { type: 'svg', errorCorrectionLevel: 'M', margin: 1 }));
  });

  it('lists a session’s labels for the sheet, with the page address and QR path', async () => {
    const tech = await signedIn(app, 'technician');
    const body = await batchBody({ count: 4 });
    const jars = await makeJars(tech, body);
    const res = await tech.agent.get(`/api/jars/labels?sessionId=${body.sessionId}`);
    expect(res.status).toBe(200);
    expect(res.body.items.map((l: { label: string }) => l.label)).toEqual(jars.map((j) => j.label));
    expect(res.body.items[0]).toMatchObject({
      qrPath: `/api/jars/${jars[0]!.id}/qr.svg`,
      grain: 'rye',
      pageUrl: `http://127.0.0.1:5180/j/${jars[0]!.label}`,
    });
    const byIds = await tech.agent.get(`/api/jars/labels?ids=${jars[2]!.id},${jars[0]!.id}`);
    expect(byIds.body.items.map((l: { id: number }) => l.id)).toEqual([jars[2]!.id, jars[0]!.id]);
  });

  it('exports the filtered jars as CSV', async () => {
    const tech = await signedIn(app, 'technician');
    const body = await batchBody({ count: 3 });
    const jars = await makeJars(tech, body);
    const res = await tech.agent.get(`/api/jars/export.csv?sessionId=${body.sessionId}&sort=-label`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toContain('text/csv');
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe(
      'label,status,grain,prep_batch,cook_run,session,culture,parent_jar,inoculum_ml,room,shelf,shelf_position,inoculated_at,inoculated_on,colonised_on,ended_on',
    );
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual(jars.map((j) => j.label).reverse());
  });
});
