import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { JarEvent } from '../../server/jars/jar-event.entity';
import { Jar } from '../../server/jars/jar.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { shelfWalkResultSchema } from '../../shared/schemas/jar-shelf';
import { jarRowSchema } from '../../shared/schemas/jars';
import { jarEvent, jarFixtures, jarRowOf, makeJars, storyOf } from './jars.fixtures';
import { bodyOf, errorOf, issuePath, itemsOf } from '../setup/bodies';

const app = createTestApp();

async function freshJars(
  client: Awaited<ReturnType<typeof signedIn>>,
  count: number,
  place: { room?: string; shelf?: string } = {},
) {
  const session = await jarFixtures.session();
  const culture = await jarFixtures.culture();
  return makeJars(client, {
    sessionId: session.id,
    count,
    grainId: await jarFixtures.grainId('millet'),
    cultureId: culture.id,
    inoculatedAt: '2026-05-04T10:30:00Z',
    ...place,
  });
}

const audits = (jarId: number) =>
  dataSource.manager.find(AuditEvent, { where: { recordType: 'jar', recordId: String(jarId) }, order: { id: 'ASC' } });

describe('POST /api/jars/:id/events', () => {
  it('walks a jar through check, shaken, colonised and released, with dates and audit events', async () => {
    const tech = await signedIn(app, 'technician');
    const [jar] = await freshJars(tech, 1);
    const id = jar!.id;
    expect(
      (
        await jarEvent(tech, id, {
          type: 'check',
          percentColonised: 35,
          note: 'even growth',
          at: '2026-05-10T09:00:00Z',
        })
      ).status,
    ).toBe(201);
    expect(jarRowOf(await jarEvent(tech, id, { type: 'shaken', at: '2026-05-10T09:02:00Z' })).status).toBe(
      'incubating',
    );
    const colonised = await jarEvent(tech, id, { type: 'colonised', at: '2026-05-18T08:00:00Z' });
    expect(colonised.body).toMatchObject({ status: 'colonised', colonisedOn: '2026-05-18', endedOn: null });
    const released = await jarEvent(tech, id, {
      type: 'released',
      releasedTo: 'customer',
      releasedToWho: 'Invented Farm Co-op',
      at: '2026-05-20T15:00:00Z',
    });
    expect(released.status).toBe(201);
    expect(released.body).toMatchObject({ status: 'released', endedOn: '2026-05-20' });

    const events = await dataSource.manager.find(JarEvent, { where: { jarId: id }, order: { at: 'ASC' } });
    expect(events.map((e) => [e.type, e.newStatus])).toEqual([
      ['check', null],
      ['shaken', null],
      ['status', 'colonised'],
      ['released', 'released'],
    ]);
    expect(events[0]).toMatchObject({ percentColonised: 35, note: 'even growth', byName: 'Test technician' });
    expect(events[3]).toMatchObject({ releasedTo: 'customer', releasedToWho: 'Invented Farm Co-op' });
    const statusAudits = (await audits(id)).filter((a) => a.field === 'status');
    expect(statusAudits.map((a) => [a.oldValue, a.newValue])).toEqual([
      ['incubating', 'colonised'],
      ['colonised', 'released'],
    ]);
  });

  it('answers 409 naming type for a transition the jar’s life does not allow, and writes nothing', async () => {
    const tech = await signedIn(app, 'technician');
    const [a, b] = await freshJars(tech, 2);
    await jarEvent(tech, a!.id, { type: 'colonised' }).expect(201);
    await jarEvent(tech, a!.id, { type: 'released', releasedTo: 'grow-room' }).expect(201);
    const eventsBefore = await dataSource.manager.countBy(JarEvent, { jarId: a!.id });
    const refused = [];
    for (const body of [
      { type: 'shaken' },
      { type: 'check', percentColonised: 50 },
      { type: 'hold', reason: 'late doubt' },
      { type: 'discarded', reason: 'tidy up' },
    ]) {
      const res = await jarEvent(tech, a!.id, body);
      refused.push([body.type, res.status, issuePath(res)]);
    }
    expect(refused).toEqual(['shaken', 'check', 'hold', 'discarded'].map((t) => [t, 409, 'type']));
    expect(errorOf(await jarEvent(tech, a!.id, { type: 'shaken' })).issues![0]!.message).toBe(
      'A released jar cannot be shaken',
    );
    expect(await dataSource.manager.countBy(JarEvent, { jarId: a!.id })).toBe(eventsBefore);
    // An incubating jar cannot go to a customer before it is colonised.
    expect(
      (await jarEvent(tech, b!.id, { type: 'released', releasedTo: 'customer', releasedToWho: 'Someone' })).status,
    ).toBe(409);
  });

  it('holds, and only a supervisor takes a jar off hold, back to where it was', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const [jar] = await freshJars(tech, 1);
    await jarEvent(tech, jar!.id, { type: 'colonised' }).expect(201);
    expect(jarRowOf(await jarEvent(tech, jar!.id, { type: 'hold', reason: 'culture under test' })).status).toBe(
      'on-hold',
    );
    expect((await jarEvent(tech, jar!.id, { type: 'shaken' })).status).toBe(409);
    expect((await jarEvent(tech, jar!.id, { type: 'resume', reason: 'agar test clean' })).status).toBe(403);
    const resumed = await jarEvent(sup, jar!.id, { type: 'resume', reason: 'agar test clean' });
    expect(jarRowOf(resumed).status).toBe('colonised');
    const story = await tech.agent.get(`/api/jars/${jar!.id}`);
    expect(storyOf(story).events.map((e) => e.type)).toEqual(['colonised', 'hold', 'resume']);
    const hold = (await audits(jar!.id)).find((a) => a.action === 'jar-hold');
    expect(hold).toMatchObject({
      field: 'status',
      oldValue: 'colonised',
      newValue: 'on-hold',
      reason: 'culture under test',
    });
  });

  it('moves a jar to the end of another shelf and discards with a reason', async () => {
    const tech = await signedIn(app, 'technician');
    const shelf = uniqueName('shelf');
    const [first] = await freshJars(tech, 1, { room: 'Incubation B', shelf });
    const [jar] = await freshJars(tech, 1, { room: 'Incubation A', shelf: uniqueName('shelf') });
    const moved = await jarEvent(tech, jar!.id, { type: 'moved', room: 'Incubation B', shelf });
    expect(moved.body).toMatchObject({ room: 'Incubation B', shelf, shelfPosition: (first!.shelfPosition ?? 0) + 1 });
    expect((await jarEvent(tech, jar!.id, { type: 'moved', room: 'Incubation B', shelf })).status).toBe(400);
    const discarded = await jarEvent(tech, jar!.id, { type: 'discarded', reason: 'lid cracked in the move' });
    expect(discarded.body).toMatchObject({ status: 'discarded' });
    expect(jarRowOf(discarded).endedOn).not.toBeNull();
  });

  it('answers 400 naming the field for a bad event', async () => {
    const tech = await signedIn(app, 'technician');
    const [jar] = await freshJars(tech, 1);
    const cases: [Record<string, unknown>, string][] = [
      [{ type: 'sprayed' }, 'type'],
      [{ type: 'check', percentColonised: 101 }, 'percentColonised'],
      [{ type: 'check' }, 'percentColonised'],
      [{ type: 'moved', room: 'A' }, 'shelf'],
      [{ type: 'released', releasedTo: 'customer' }, 'releasedToWho'],
      [{ type: 'released', releasedTo: 'market' }, 'releasedTo'],
      [{ type: 'hold' }, 'reason'],
      [{ type: 'discarded', reason: '' }, 'reason'],
      [{ type: 'shaken', at: '2099-01-01T00:00:00Z' }, 'at'],
      [{ type: 'shaken', at: '2020-01-01T00:00:00Z' }, 'at'],
    ];
    const got = [];
    for (const [body] of cases) {
      const res = await jarEvent(tech, jar!.id, body);
      got.push([body, res.status, issuePath(res)]);
    }
    expect(got).toEqual(cases.map(([body, path]) => [body, 400, path]));
  });
});

describe('shelf walk', () => {
  it('lists a shelf in place order without ended jars, and marks each jar in one go', async () => {
    const tech = await signedIn(app, 'technician');
    const shelf = uniqueName('shelf');
    const jars = await freshJars(tech, 4, { room: 'Incubation C', shelf });
    await jarEvent(tech, jars[3]!.id, { type: 'discarded', reason: 'dropped' }).expect(201);
    await jarEvent(tech, jars[0]!.id, { type: 'check', percentColonised: 40 }).expect(201);

    const listed = await tech.agent.get(`/api/jars/shelf?room=Incubation C&shelf=${shelf}`);
    expect(listed.status).toBe(200);
    expect(bodyOf(listed, itemsOf(jarRowSchema)).items.map((j) => j.label)).toEqual(
      jars.slice(0, 3).map((j) => j.label),
    );

    const marks = [
      { jarId: jars[0]!.id, mark: 'clean' },
      { jarId: jars[1]!.id, mark: 'colonised' },
      { jarId: jars[2]!.id, mark: 'shaken' },
    ];
    const res = await tech.agent.post('/api/jars/shelf-walk').set('X-CSRF-Token', tech.token()).send({ marks });
    expect(res.status).toBe(200);
    const walk = bodyOf(res, shelfWalkResultSchema);
    expect(walk.marked).toBe(3);
    expect(walk.jars.map((j) => j.status)).toEqual(['incubating', 'colonised', 'incubating']);
    const clean = await dataSource.manager.find(JarEvent, {
      where: { jarId: jars[0]!.id, type: 'check' },
      order: { id: 'ASC' },
    });
    // A clean mark keeps the last recorded percent instead of claiming 0 %.
    expect(clean.map((e) => e.percentColonised)).toEqual([40, 40]);
    expect(await dataSource.manager.countBy(JarEvent, { jarId: jars[2]!.id, type: 'shaken' })).toBe(1);
  });

  it('writes nothing when one mark is refused, and names that mark', async () => {
    const tech = await signedIn(app, 'technician');
    const jars = await freshJars(tech, 3, { room: 'Incubation C', shelf: uniqueName('shelf') });
    await jarEvent(tech, jars[1]!.id, { type: 'colonised' }).expect(201);
    const res = await tech.agent
      .post('/api/jars/shelf-walk')
      .set('X-CSRF-Token', tech.token())
      .send({
        marks: [
          { jarId: jars[0]!.id, mark: 'shaken' },
          { jarId: jars[1]!.id, mark: 'colonised' },
        ],
      });
    expect(res.status).toBe(409);
    expect(issuePath(res)).toBe('marks.1.mark');
    expect(await dataSource.manager.countBy(JarEvent, { jarId: jars[0]!.id })).toBe(0);
    const missing = await tech.agent
      .post('/api/jars/shelf-walk')
      .set('X-CSRF-Token', tech.token())
      .send({ marks: [{ jarId: 99999999, mark: 'clean' }] });
    expect(missing.status).toBe(422);
    expect(issuePath(missing)).toBe('marks.0.jarId');
    expect((await dataSource.manager.findOneByOrFail(Jar, { id: jars[0]!.id })).status).toBe('incubating');
  });

  it('answers 400 naming the field for a bad walk', async () => {
    const tech = await signedIn(app, 'technician');
    const [jar] = await freshJars(tech, 1);
    const post = (body: unknown) =>
      tech.agent
        .post('/api/jars/shelf-walk')
        .set('X-CSRF-Token', tech.token())
        .send(body as object);
    expect(issuePath(await post({ marks: [] }))).toBe('marks');
    expect(issuePath(await post({ marks: [{ jarId: jar!.id, mark: 'sparkly' }] }))).toBe('marks.0.mark');
    const twice = await post({
      marks: [
        { jarId: jar!.id, mark: 'clean' },
        { jarId: jar!.id, mark: 'shaken' },
      ],
    });
    expect(twice.status).toBe(400);
    expect(issuePath(twice)).toBe('marks.1.jarId');
  });
});
