import { randomBytes } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { cultureUseWarning } from '../../server/cultures/cultures.service';
import { dataSource } from '../../server/db/data-source';
import { Photo } from '../../server/photos/photo.entity';
import { pageOf } from '../../shared/schemas/common';
import { cultureDetailSchema, cultureSchema } from '../../shared/schemas/cultures';
import { createTestApp } from '../setup/test-app';
import { anonymousStatuses, sendAs, signedIn, uniqueName, type Client } from '../setup/factories';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();

const newCulture = (over: Record<string, unknown> = {}) => ({
  code: uniqueName('LC'),
  species: 'Pleurotus ostreatus',
  strain: 'grey oyster, lab line 4',
  preparedOn: '2026-02-10',
  generation: 2,
  volumeMl: 500,
  ...over,
});

let tech: Client;
let supervisor: Client;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
  supervisor = await signedIn(app, 'supervisor');
});

const create = (client: Client, body: Record<string, unknown>) => sendAs(client, 'post', '/api/cultures', body);
const changeState = (client: Client, id: number, body: Record<string, unknown>) =>
  sendAs(client, 'post', `/api/cultures/${id}/state`, body);
/** A new culture, as its create route answers. */
const created = async (client: Client, body: Record<string, unknown>) =>
  bodyOf(await create(client, body), cultureDetailSchema);
const culturePageSchema = pageOf(cultureSchema);

describe('/api/cultures guards and validation', () => {
  it('answers 401 without a session', async () => {
    const urls = ['/api/cultures', '/api/cultures/1', '/api/cultures/export.csv'];
    expect(await anonymousStatuses(app, urls)).toEqual([401, 401, 401]);
  });

  it('answers 403 to a trainer writing and to a technician changing state', async () => {
    const trainer = await signedIn(app, 'trainer');
    const culture = await created(tech, newCulture());
    expect((await trainer.agent.get(`/api/cultures/${culture.id}`)).status).toBe(200);
    expect((await create(trainer, newCulture())).status).toBe(403);
    const test = await sendAs(trainer, 'post', `/api/cultures/${culture.id}/agar-tests`, {
      testedOn: '2026-02-12',
      result: 'clean',
    });
    expect(test.status).toBe(403);
    expect((await changeState(tech, culture.id, { state: 'released', reason: 'agar clean' })).status).toBe(403);
    expect((await changeState(trainer, culture.id, { state: 'released', reason: 'agar clean' })).status).toBe(403);
  });

  it.each([
    ['code', { code: '' }],
    ['preparedOn', { preparedOn: '10/02/2026' }],
    ['volumeMl', { volumeMl: 0 }],
    ['generation', { generation: 1.5 }],
  ])('answers 400 naming %s', async (field, over) => {
    const res = await create(tech, newCulture(over));
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe(field);
  });

  it('answers 400 naming parentCultureId for an unknown parent and state for an unknown state', async () => {
    const res = await create(tech, newCulture({ parentCultureId: 999999 }));
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('parentCultureId');
    const culture = await created(tech, newCulture());
    const bad = await changeState(supervisor, culture.id, { state: 'approved', reason: 'x'.repeat(5) });
    expect(issuePath(bad)).toBe('state');
    const noReason = await changeState(supervisor, culture.id, { state: 'released' });
    expect(noReason.status).toBe(400);
    expect(issuePath(noReason)).toBe('reason');
  });

  it('answers 404 for an unknown culture', async () => {
    expect((await tech.agent.get('/api/cultures/999999')).status).toBe(404);
    const patch = await sendAs(tech, 'patch', '/api/cultures/999999', { notes: 'x' });
    expect(patch.status).toBe(404);
    expect((await changeState(supervisor, 999999, { state: 'released', reason: 'agar clean' })).status).toBe(404);
    const test = await sendAs(tech, 'post', '/api/cultures/999999/agar-tests', {
      testedOn: '2026-02-12',
      result: 'clean',
    });
    expect(test.status).toBe(404);
  });

  it('answers 409 naming code when the code is taken', async () => {
    const body = newCulture();
    await create(tech, body).then((r) => expect(r.status).toBe(201));
    const res = await create(tech, body);
    expect(res.status).toBe(409);
    expect(issuePath(res)).toBe('code');
  });
});

describe('/api/cultures records', () => {
  it('creates a quarantined culture, infers the generation from its parent, and shows the family', async () => {
    const parent = await created(tech, newCulture({ generation: 3 }));
    expect(parent.state).toBe('quarantined');
    expect(parent.allowedStates).toEqual(['released', 'retired']);
    const child = await created(tech, newCulture({ parentCultureId: parent.id, generation: undefined }));
    expect(child).toMatchObject({
      generation: 4,
      parentCode: parent.code,
      parent: { id: parent.id, code: parent.code },
    });
    const detail = await tech.agent.get(`/api/cultures/${parent.id}`);
    expect(bodyOf(detail, cultureDetailSchema).children.map((c) => c.id)).toEqual([child.id]);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'culture',
      recordId: String(child.id),
      action: 'create',
    });
    expect(audit?.newValue).toContain('quarantined');
  });

  it('moves quarantined → released → retired with reasons in the audit trail, and refuses any other step', async () => {
    const culture = await created(tech, newCulture());
    const released = await changeState(supervisor, culture.id, {
      state: 'released',
      reason: 'agar plate clean after 7 days',
    });
    expect(released.status).toBe(200);
    expect(released.body).toMatchObject({ state: 'released', allowedStates: ['retired'] });
    const back = await changeState(supervisor, culture.id, { state: 'quarantined', reason: 'second thoughts' });
    expect(back.status).toBe(409);
    expect(issuePath(back)).toBe('state');
    const retired = await changeState(supervisor, culture.id, { state: 'retired', reason: 'syringes used up' });
    expect(retired.body).toMatchObject({ state: 'retired', allowedStates: [] });
    expect((await changeState(supervisor, culture.id, { state: 'released', reason: 'again' })).status).toBe(409);
    const events = await dataSource.manager.find(AuditEvent, {
      where: { recordType: 'culture', recordId: String(culture.id), action: 'state' },
      order: { id: 'ASC' },
    });
    expect(events.map((e) => [e.oldValue, e.newValue, e.reason, e.userName])).toEqual([
      ['quarantined', 'released', 'agar plate clean after 7 days', 'Test supervisor'],
      ['released', 'retired', 'syringes used up', 'Test supervisor'],
    ]);
  });

  it('lets an admin retire a quarantined culture directly', async () => {
    const admin = await signedIn(app, 'admin');
    const culture = await created(tech, newCulture());
    const res = await changeState(admin, culture.id, { state: 'retired', reason: 'failed agar test' });
    expect(bodyOf(res, cultureDetailSchema).state).toBe('retired');
  });

  it('warns when a culture that is not released is used', async () => {
    const culture = await created(tech, newCulture());
    expect(await cultureUseWarning(culture.id)).toBe(`Culture ${culture.code} is quarantined, not released.`);
    await changeState(supervisor, culture.id, { state: 'released', reason: 'agar clean' });
    expect(await cultureUseWarning(culture.id)).toBeNull();
    await changeState(supervisor, culture.id, { state: 'retired', reason: 'used up' });
    expect(await cultureUseWarning(culture.id)).toBe(`Culture ${culture.code} is retired, not released.`);
  });

  it('records agar tests, newest first, and checks the photo exists', async () => {
    const culture = await created(tech, newCulture());
    const post = (body: Record<string, unknown>) =>
      sendAs(tech, 'post', `/api/cultures/${culture.id}/agar-tests`, body);
    // A photo row as the upload route leaves it; the test needs only its id.
    const sha256 = randomBytes(32).toString('hex');
    const photo = await dataSource.manager.save(
      dataSource.manager.create(Photo, { sha256, mime: 'image/jpeg', bytes: 10, storageKey: `${sha256}.jpg` }),
    );
    expect((await post({ testedOn: '2026-02-12', result: 'inconclusive', notes: 'plate dried out' })).status).toBe(201);
    const second = await post({ testedOn: '2026-02-15', result: 'clean', photoId: photo.id });
    expect(second.status).toBe(201);
    expect(second.body).toMatchObject({ result: 'clean', photoId: photo.id, recordedById: tech.user.id });
    const badPhoto = await post({ testedOn: '2026-02-16', result: 'clean', photoId: 999999 });
    expect(badPhoto.status).toBe(400);
    expect(issuePath(badPhoto)).toBe('photoId');
    const badResult = await post({ testedOn: '2026-02-16', result: 'dirty' });
    expect(issuePath(badResult)).toBe('result');
    const detail = await tech.agent.get(`/api/cultures/${culture.id}`);
    expect(bodyOf(detail, cultureDetailSchema).agarTests.map((t) => t.testedOn)).toEqual(['2026-02-15', '2026-02-12']);
  });

  it('audits edits field by field and refuses a parent loop', async () => {
    const a = await created(tech, newCulture());
    const b = await created(tech, newCulture({ parentCultureId: a.id }));
    const res = await sendAs(tech, 'patch', `/api/cultures/${a.id}`, {
      volumeMl: 250,
      strain: '',
      reason: 'half poured off',
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ volumeMl: 250, strain: null });
    const events = await dataSource.manager.findBy(AuditEvent, {
      recordType: 'culture',
      recordId: String(a.id),
      action: 'update',
    });
    expect(events.map((e) => [e.field, e.oldValue, e.newValue, e.reason]).sort()).toEqual([
      ['strain', 'grey oyster, lab line 4', null, 'half poured off'],
      ['volumeMl', '500', '250', 'half poured off'],
    ]);
    const loop = await sendAs(tech, 'patch', `/api/cultures/${a.id}`, { parentCultureId: b.id });
    expect(loop.status).toBe(400);
    expect(issuePath(loop)).toBe('parentCultureId');
    const state = await sendAs(tech, 'patch', `/api/cultures/${a.id}`, { state: 'released' });
    expect(state.status).toBe(200);
    expect(bodyOf(state, cultureDetailSchema).state).toBe('quarantined');
  });

  it('pages, sorts and filters on the server, and exports CSV', async () => {
    const species = uniqueName('Hericium');
    for (const code of ['b', 'c', 'a']) await create(tech, newCulture({ code: `${species}-${code}`, species }));
    const first = bodyOf(await tech.agent.get(`/api/cultures?q=${species}&sort=-code&pageSize=2`), culturePageSchema);
    expect(first.total).toBe(3);
    expect(first.items.map((c) => c.code)).toEqual([`${species}-c`, `${species}-b`]);
    await changeState(supervisor, first.items[0]!.id, { state: 'released', reason: 'agar clean' });
    const released = bodyOf(await tech.agent.get(`/api/cultures?q=${species}&state=released`), culturePageSchema);
    expect(released.items.map((c) => c.code)).toEqual([`${species}-c`]);
    expect(issuePath(await tech.agent.get('/api/cultures?state=approved'))).toBe('state');

    const csv = await tech.agent.get(`/api/cultures/export.csv?q=${species}&sort=code`);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const lines = csv.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe('code,species,strain,prepared_on,generation,volume_ml,parent,state,notes');
    expect(lines.slice(1).map((l) => l.split(',')[0])).toEqual([`${species}-a`, `${species}-b`, `${species}-c`]);
    expect(lines[3]).toContain(',released,');
  });
});
