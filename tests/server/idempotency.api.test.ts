import { randomUUID } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { dataSource } from '../../server/db/data-source';
import { IncidentJar } from '../../server/incidents/incident-jar.entity';
import { JarEvent } from '../../server/jars/jar-event.entity';
import { Jar } from '../../server/jars/jar.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn, type Client } from '../setup/factories';
import { shelfPlaceSchema } from '../../shared/schemas/jar-shelf';
import { jarRowSchema } from '../../shared/schemas/jars';
import { auditCount, incidentOf, makeJar, makeJpeg, makeProduction, photosOf } from './incidents-fixtures';
import { bodyOf, errorOf, issuePath, itemsOf } from '../setup/bodies';

const app = createTestApp();

const flag = (label: string) => ({
  jarLabels: [label],
  contaminant: 'bacterial',
  severity: 'low',
  stage: 'incubation',
  sealed: true,
  sterilisedBeforeDisposal: false,
});

const postWithKey = (c: Client, url: string, key: string, body: object) =>
  c.agent.post(url).set('X-CSRF-Token', c.token()).set('Idempotency-Key', key).send(body);

const incidentsOf = (jarId: number) => dataSource.manager.countBy(IncidentJar, { jarId });

describe('Idempotency-Key on a new incident', () => {
  it('answers a repeat with the first result and writes one incident', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    const key = randomUUID();
    const first = await postWithKey(tech, '/api/incidents', key, flag(jar.label));
    const again = await postWithKey(tech, '/api/incidents', key, flag(jar.label));
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(incidentOf(again).id).toBe(incidentOf(first).id);
    expect(await incidentsOf(jar.id)).toBe(1);
  });

  it('makes one incident from two repeats sent at the same moment', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    const key = randomUUID();
    const [a, b] = await Promise.all([
      postWithKey(tech, '/api/incidents', key, flag(jar.label)),
      postWithKey(tech, '/api/incidents', key, flag(jar.label)),
    ]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(incidentOf(a).id).toBe(incidentOf(b).id);
    expect(await incidentsOf(jar.id)).toBe(1);
    expect(await auditCount('incident', incidentOf(a).id)).toBe(1);
  });

  it('keeps keys per user: the same key from another technician is their own write', async () => {
    const [one, two] = [await signedIn(app, 'technician'), await signedIn(app, 'technician')];
    const prod = await makeProduction();
    const [j1, j2] = [await makeJar(prod), await makeJar(prod)];
    const key = randomUUID();
    const a = await postWithKey(one, '/api/incidents', key, flag(j1.label));
    const b = await postWithKey(two, '/api/incidents', key, flag(j2.label));
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(incidentOf(a).id).not.toBe(incidentOf(b).id);
  });

  it('leaves a refused write unrecorded, so the fixed item can be sent under the same key', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    const key = randomUUID();
    const refused = await postWithKey(tech, '/api/incidents', key, flag('NO-SUCH-JAR-1'));
    expect(refused.status).toBe(422);
    expect(issuePath(refused)).toBe('jarLabels.0');
    const fixed = await postWithKey(tech, '/api/incidents', key, flag(jar.label));
    expect(fixed.status).toBe(201);
    expect(fixed.headers['idempotent-replayed']).toBeUndefined();
  });

  it('answers 400 naming the header for a malformed key, and 422 for a key reused on another route', async () => {
    const tech = await signedIn(app, 'technician');
    const prod = await makeProduction();
    const jar = await makeJar(prod);
    const bad = await postWithKey(tech, '/api/incidents', 'short', flag(jar.label));
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('Idempotency-Key');
    const key = randomUUID();
    expect((await postWithKey(tech, '/api/incidents', key, flag(jar.label))).status).toBe(201);
    const other = await makeJar(prod);
    const reused = await postWithKey(tech, '/api/jars/shelf-walk', key, {
      marks: [{ jarId: other.id, mark: 'clean' }],
    });
    expect(reused.status).toBe(422);
    expect(errorOf(reused).code).toBe('idempotency-key-reused');
  });
});

describe('Idempotency-Key on a photo upload', () => {
  it('answers a repeat with the first photos and audits one upload', async () => {
    const tech = await signedIn(app, 'technician');
    const jpeg = await makeJpeg();
    const key = randomUUID();
    const send = () =>
      tech.agent
        .post('/api/photos')
        .set('X-CSRF-Token', tech.token())
        .set('Idempotency-Key', key)
        .attach('photos', jpeg, 'jar.jpg');
    const [a, b] = await Promise.all([send(), send()]);
    expect([a.status, b.status]).toEqual([201, 201]);
    expect(photosOf(b)[0]!.id).toBe(photosOf(a)[0]!.id);
    expect(await auditCount('photo', photosOf(a)[0]!.id)).toBe(1);
  });
});

describe('shelf marks: repeat, undo and the walk lists', () => {
  const mark = (jarId: number, kind = 'colonised') => ({ marks: [{ jarId, mark: kind }] });

  it('writes one event for a repeated mark and undoes it back to incubating', async () => {
    const tech = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    const key = randomUUID();
    const [a, b] = await Promise.all([
      postWithKey(tech, '/api/jars/shelf-walk', key, mark(jar.id)),
      postWithKey(tech, '/api/jars/shelf-walk', key, mark(jar.id)),
    ]);
    expect([a.status, b.status]).toEqual([200, 200]);
    expect(await dataSource.manager.countBy(JarEvent, { jarId: jar.id })).toBe(1);
    expect((await dataSource.manager.findOneByOrFail(Jar, { id: jar.id })).status).toBe('colonised');

    const undo = await postWithKey(tech, '/api/jars/shelf-walk/undo', randomUUID(), { key });
    expect(undo.status).toBe(200);
    expect(undo.body).toMatchObject({ id: jar.id, status: 'incubating', colonisedOn: null });
    expect(await dataSource.manager.countBy(JarEvent, { jarId: jar.id })).toBe(0);
    expect(await auditCount('jar', jar.id)).toBeGreaterThanOrEqual(2);
    const twice = await postWithKey(tech, '/api/jars/shelf-walk/undo', randomUUID(), { key });
    expect(twice.status).toBe(410);
  });

  it("refuses to undo a mark that a later event followed, and another user's mark", async () => {
    const tech = await signedIn(app, 'technician');
    const other = await signedIn(app, 'technician');
    const jar = await makeJar(await makeProduction());
    const key = randomUUID();
    expect((await postWithKey(tech, '/api/jars/shelf-walk', key, mark(jar.id, 'clean'))).status).toBe(200);
    expect((await postWithKey(other, '/api/jars/shelf-walk/undo', randomUUID(), { key })).status).toBe(404);
    expect((await postWithKey(tech, '/api/jars/shelf-walk', randomUUID(), mark(jar.id, 'shaken'))).status).toBe(200);
    const late = await postWithKey(tech, '/api/jars/shelf-walk/undo', randomUUID(), { key });
    expect(late.status).toBe(409);
    expect(issuePath(late)).toBe('key');
  });

  it('walks only incubating jars and lists the rooms and shelves that hold them', async () => {
    const tech = await signedIn(app, 'technician');
    const prod = await makeProduction();
    const room = `Room ${randomUUID().slice(0, 6)}`;
    const growing = await makeJar(prod);
    const done = await makeJar(prod, { status: 'colonised' });
    await dataSource.manager.update(Jar, [growing.id, done.id], { room, shelf: 'B1' });
    const shelf = await tech.agent.get('/api/jars/shelf').query({ room, shelf: 'B1' });
    expect(bodyOf(shelf, itemsOf(jarRowSchema)).items.map((j) => j.id)).toEqual([growing.id]);
    const places = await tech.agent.get('/api/jars/shelves');
    expect(places.status).toBe(200);
    expect(bodyOf(places, itemsOf(shelfPlaceSchema)).items).toContainEqual({ room, shelf: 'B1', incubating: 1 });
  });
});
