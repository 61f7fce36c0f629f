import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { todayLocal } from '../../server/core/local-time';
import { dataSource } from '../../server/db/data-source';
import { onIncidentCreated, type IncidentCreatedEvent } from '../../server/incidents/incident-events';
import { liveIncidentJarsSubquery } from '../../server/incidents/live-incidents';
import { JarEvent } from '../../server/jars/jar-event.entity';
import { Jar } from '../../server/jars/jar.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { pageOf } from '../../shared/schemas/common';
import { incidentListItemSchema } from '../../shared/schemas/incidents';
import { auditCount, incidentOf, makeJar, makeJpeg, makeProduction, photosOf } from './incidents-fixtures';
import { bodyOf, errorOf, issuePath } from '../setup/bodies';

const app = createTestApp();
const incidentPageSchema = pageOf(incidentListItemSchema);
type Client = Awaited<ReturnType<typeof signedIn>>;

const flag = (jarLabels: string[], extra: Record<string, unknown> = {}) => ({
  jarLabels,
  contaminant: 'trichoderma',
  signColour: 'green',
  signTexture: 'powdery',
  severity: 'medium',
  stage: 'incubation',
  sealed: true,
  sterilisedBeforeDisposal: false,
  ...extra,
});

const post = (c: Client, body: unknown) =>
  c.agent
    .post('/api/incidents')
    .set('X-CSRF-Token', c.token())
    .send(body as object);

describe('POST /api/incidents', () => {
  it('answers 401 without a session and 403 to a trainer', async () => {
    const prod = await makeProduction();
    const jar = await makeJar(prod);
    const anon = await supertest(app).get('/api/incidents');
    expect(anon.status).toBe(401);
    const trainer = await signedIn(app, 'trainer');
    expect((await post(trainer, flag([jar.label]))).status).toBe(403);
  });

  it('flags several jars, marks them contaminated with jar events, and audits it', async () => {
    const tech = await signedIn(app, 'technician');
    const prod = await makeProduction();
    const a = await makeJar(prod);
    const b = await makeJar(prod, { status: 'colonised' });
    const up = await tech.agent
      .post('/api/photos')
      .set('X-CSRF-Token', tech.token())
      .attach('photos', await makeJpeg(), 'a.jpg');
    const res = await post(
      tech,
      flag([a.label.toLowerCase(), b.label], { photoIds: [photosOf(up)[0]!.id], notes: 'two jars on shelf B2' }),
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      status: 'open',
      verdict: 'pending',
      voided: false,
      foundByName: 'Test technician',
      contaminant: 'trichoderma',
    });
    const incident = incidentOf(res);
    expect(incident.jars.map((j) => j.label).sort()).toEqual([a.label, b.label].sort());
    expect(incident.jars[0]).toMatchObject({
      status: 'contaminated',
      grain: 'rye',
      cookRun: { code: prod.cookRun.code },
      culture: { code: prod.culture.code },
    });
    expect(incident.photos).toHaveLength(1);
    expect(incident.history[0]).toMatchObject({
      action: 'create',
      recordType: 'incident',
      userName: 'Test technician',
    });

    const jars = await dataSource.manager.findBy(Jar, [{ id: a.id }, { id: b.id }]);
    expect(jars.every((j) => j.status === 'contaminated')).toBe(true);
    const events = await dataSource.manager.findBy(JarEvent, { jarId: a.id, newStatus: 'contaminated' });
    expect(events).toHaveLength(1);
    expect(await auditCount('jar', a.id)).toBe(1);
    expect(await auditCount('incident', incident.id)).toBe(1);
  });

  it('answers 400 naming the field for a contaminant not on the list', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    const res = await post(tech, flag([jar.label], { contaminant: 'purple' }));
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('contaminant');
    const none = await post(tech, flag([]));
    expect(none.status).toBe(400);
    expect(errorOf(none).issues!.map((i: { path: string }) => i.path)).toContain('jarLabels');
  });

  it('answers 422 naming the label of an unknown jar and writes nothing', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    const res = await post(tech, flag([jar.label, 'NO-SUCH-JAR']));
    expect(res.status).toBe(422);
    expect(issuePath(res)).toBe('jarLabels.1');
    expect((await dataSource.manager.findOneByOrFail(Jar, { id: jar.id })).status).toBe('incubating');
  });

  it('answers 422 for a find before the jar was inoculated, in the future, or with an unknown photo', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction(), { daysAgo: 3 });
    const early = await post(
      tech,
      flag([jar.label], { foundAt: new Date(Date.now() - 10 * 86_400_000).toISOString() }),
    );
    expect(early.status).toBe(422);
    expect(issuePath(early)).toBe('foundAt');
    const future = await post(tech, flag([jar.label], { foundAt: new Date(Date.now() + 86_400_000).toISOString() }));
    expect(future.status).toBe(422);
    const photo = await post(tech, flag([jar.label], { photoIds: [999999] }));
    expect(photo.status).toBe(422);
    expect(issuePath(photo)).toBe('photoIds');
  });

  it('tells listeners about a new incident after it is committed', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    const heard = new Promise<IncidentCreatedEvent>((resolve) => {
      const off = onIncidentCreated((e) => {
        if (!e.jarLabels.includes(jar.label)) return;
        off();
        resolve(e);
      });
    });
    const res = await post(tech, flag([jar.label], { severity: 'high' }));
    const event = await heard;
    expect(event).toMatchObject({ id: incidentOf(res).id, severity: 'high', jarLabels: [jar.label] });
  });
});

describe('GET /api/incidents/:id', () => {
  it('shows jar lineage from parent jar to culture, and 404 for an unknown id', async () => {
    const tech = await signedIn(app, 'technician');
    const prod = await makeProduction();
    const parent = await makeJar(prod, { status: 'colonised', daysAgo: 20 });
    const child = await makeJar(prod, { parentJarId: parent.id, daysAgo: 4 });
    const res = await post(tech, flag([child.label]));
    const detail = await tech.agent.get(`/api/incidents/${incidentOf(res).id}`);
    expect(detail.status).toBe(200);
    expect(incidentOf(detail).jars[0]!.parentJar).toEqual({ id: parent.id, label: parent.label });
    expect(incidentOf(detail).jars[0]!.ancestry).toEqual([
      { kind: 'jar', id: parent.id, code: parent.label },
      { kind: 'culture', id: prod.culture.id, code: prod.culture.code },
    ]);
    expect((await tech.agent.get('/api/incidents/999999')).status).toBe(404);
    expect((await tech.agent.get('/api/incidents/zero')).status).toBe(400);
  });
});

describe('GET /api/incidents', () => {
  it('filters by cook run, culture, session, operator, contaminant and period, and pages on the server', async () => {
    const tech = await signedIn(app, 'technician');
    const prod = await makeProduction();
    const other = await makeProduction();
    const ids: number[] = [];
    for (const contaminant of ['bacterial', 'penicillium', 'bacterial']) {
      ids.push(incidentOf(await post(tech, flag([(await makeJar(prod)).label], { contaminant }))).id);
    }
    await post(tech, flag([(await makeJar(other)).label]));
    const list = async (q: string) => {
      const res = await tech.agent.get(`/api/incidents?${q}`);
      return { res, page: bodyOf(res, incidentPageSchema) };
    };

    const byRun = await list(`cookRunId=${prod.cookRun.id}&sort=id`);
    expect(byRun.res.body).toMatchObject({ total: 3, page: 1, pageSize: 25 });
    expect(byRun.page.items.map((i) => i.id)).toEqual(ids);
    expect(byRun.page.items[0]!.jarLabels).toHaveLength(1);
    expect((await list(`cultureId=${prod.culture.id}`)).page.total).toBe(3);
    expect((await list(`sessionId=${prod.session.id}&contaminant=bacterial`)).page.total).toBe(2);
    expect((await list(`operator=${encodeURIComponent(prod.operatorName)}`)).page.total).toBe(3);
    const paged = await list(`cookRunId=${prod.cookRun.id}&pageSize=2&page=2&sort=-id`);
    expect(paged.page.items.map((i) => i.id)).toEqual([ids[0]]);
    // Periods are inclusive local dates (DESIGN.md §3): today..today holds today's finds.
    const today = todayLocal();
    expect((await list(`cookRunId=${prod.cookRun.id}&from=${today}&to=${today}`)).page.total).toBe(3);
    expect((await list(`cookRunId=${prod.cookRun.id}&to=2000-01-01`)).page.total).toBe(0);
  });

  it('answers 400 naming the field for a bad filter, sort or page size', async () => {
    const tech = await signedIn(app, 'technician');
    const cases: [string, string][] = [
      ['status=lost', 'status'],
      ['pageSize=500', 'pageSize'],
      ['from=2026-13-01', 'from'],
      ['from=2026-03-02&to=2026-03-01', 'to'],
      ['sort=colour', 'sort'],
    ];
    const answers = [];
    for (const [q] of cases) {
      const res = await tech.agent.get(`/api/incidents?${q}`);
      answers.push([q, res.status, issuePath(res)]);
    }
    expect(answers).toEqual(cases.map(([q, field]) => [q, 400, field]));
  });

  it('exports the filtered register as CSV', async () => {
    const tech = await signedIn(app, 'technician');
    const prod = await makeProduction();
    const jar = await makeJar(prod);
    await post(tech, flag([jar.label], { notes: 'found at "shelf B", left side' }));
    const res = await tech.agent.get(`/api/incidents/export.csv?cookRunId=${prod.cookRun.id}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    const lines = res.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines).toHaveLength(2);
    expect(lines[0]).toMatch(/^id,found_at_utc,found_on,found_by,/);
    expect(lines[1]).toContain(jar.label);
    expect(lines[1]).toContain(prod.cookRun.code);
    expect(lines[1]).toContain('"found at ""shelf B"", left side"');
    expect((await supertest(app).get('/api/incidents/export.csv')).status).toBe(401);
  });

  it('shares one definition of a contaminated jar with the analysis', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    await post(tech, flag([jar.label]));
    const rows: { jarId: number }[] = await dataSource.query(`${liveIncidentJarsSubquery()} AND live_ij.jarId = ?`, [
      jar.id,
    ]);
    expect(rows.map((r) => Number(r.jarId))).toEqual([jar.id]);
  });
});
