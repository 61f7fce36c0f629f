import supertest from 'supertest';
import { In } from 'typeorm';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { JarEvent } from '../../server/jars/jar-event.entity';
import { Jar } from '../../server/jars/jar.entity';
import { holdResultSchema } from '../../shared/schemas/jar-lineage';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { jarEvent, jarFixtures, makeJars, type JarRow } from './jars.fixtures';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();
const holdOf = (res: { body: unknown }) => bodyOf(res, holdResultSchema);
type Client = Awaited<ReturnType<typeof signedIn>>;

interface Tree {
  node: { kind: string; label?: string; code?: string; status?: string };
  children: Tree[];
}

/** A culture → 3 jars → 2 grain-to-grain jars from each (6), all still incubating. */
async function threeGenerations(tech: Client) {
  const culture = await jarFixtures.culture();
  const session = await jarFixtures.session();
  const grainId = await jarFixtures.grainId('wheat');
  const base = { sessionId: session.id, grainId, inoculatedAt: '2026-05-04T10:30:00Z' };
  const first = await makeJars(tech, { ...base, count: 3, cultureId: culture.id });
  const second: JarRow[] = [];
  for (const parent of first) second.push(...(await makeJars(tech, { ...base, count: 2, parentJarId: parent.id })));
  return { culture, first, second };
}

const hold = (client: Client, path: string, reason = 'culture failed its agar test') =>
  client.agent.post(`/api/lineage/${path}/hold`).set('X-CSRF-Token', client.token()).send({ reason });

describe('lineage', () => {
  it('answers 401, 403, 400 and 404 as the roles and inputs require', async () => {
    expect((await supertest(app).get('/api/lineage/culture/1')).status).toBe(401);
    const tech = await signedIn(app, 'technician');
    const { culture } = await threeGenerations(tech);
    expect((await hold(tech, `culture/${culture.id}`)).status).toBe(403);
    const trainer = await signedIn(app, 'trainer');
    expect((await hold(trainer, `culture/${culture.id}`)).status).toBe(403);
    expect((await trainer.agent.get(`/api/lineage/culture/${culture.id}`)).status).toBe(200);
    const sup = await signedIn(app, 'supervisor');
    const noReason = await sup.agent
      .post(`/api/lineage/culture/${culture.id}/hold`)
      .set('X-CSRF-Token', sup.token())
      .send({});
    expect(noReason.status).toBe(400);
    expect(issuePath(noReason)).toBe('reason');
    expect((await sup.agent.get('/api/lineage/culture/99999999')).status).toBe(404);
    expect((await sup.agent.get('/api/lineage/jar/99999999')).status).toBe(404);
    expect((await hold(sup, 'culture/99999999')).status).toBe(404);
    expect((await hold(sup, 'jar/99999999')).status).toBe(404);
    expect((await sup.agent.get('/api/lineage/jar/abc')).status).toBe(400);
  });

  it('draws the tree of everything made from a culture', async () => {
    const tech = await signedIn(app, 'technician');
    const { culture, first, second } = await threeGenerations(tech);
    const res = await tech.agent.get(`/api/lineage/culture/${culture.id}`);
    expect(res.status).toBe(200);
    const tree = res.body as Tree;
    expect(tree.node).toMatchObject({ kind: 'culture', code: culture.code });
    expect(tree.children.map((c) => c.node.label)).toEqual(first.map((j) => j.label));
    expect(tree.children.map((c) => c.children.map((g) => g.node.label))).toEqual([
      second.slice(0, 2).map((j) => j.label),
      second.slice(2, 4).map((j) => j.label),
      second.slice(4, 6).map((j) => j.label),
    ]);
    const fromJar = (await tech.agent.get(`/api/lineage/jar/${first[1]!.id}`)).body as Tree;
    expect(fromJar.node.label).toBe(first[1]!.label);
    expect(fromJar.children).toHaveLength(2);
  });

  it('holds a culture’s 9 unreleased descendants in one transaction, with an audit event each', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { culture, first, second } = await threeGenerations(tech);
    const all = [...first, ...second];
    const res = await hold(sup, `culture/${culture.id}`);
    expect(res.status).toBe(200);
    expect([...holdOf(res).held].sort()).toEqual(all.map((j) => j.label).sort());
    expect(holdOf(res).recall).toEqual([]);

    const ids = all.map((j) => j.id);
    const jars = await dataSource.manager.findBy(Jar, { id: In(ids) });
    expect(jars.every((j) => j.status === 'on-hold')).toBe(true);
    const events = await dataSource.manager.findBy(JarEvent, { jarId: In(ids), type: 'hold' });
    expect(events).toHaveLength(9);
    // One transaction writes one instant on every hold event.
    expect(new Set(events.map((e) => e.at.getTime())).size).toBe(1);
    const audit = await dataSource.manager.findBy(AuditEvent, {
      action: 'lineage-hold',
      recordType: 'jar',
      recordId: In(ids.map(String)),
    });
    expect(audit).toHaveLength(9);
    expect(
      audit.every((a) => a.oldValue === 'incubating' && a.newValue === 'on-hold' && a.userName === 'Test supervisor'),
    ).toBe(true);

    // Holding again changes nothing and reports the jars as already held.
    const again = await hold(sup, `culture/${culture.id}`);
    expect(holdOf(again).held).toEqual([]);
    expect(holdOf(again).unchanged).toHaveLength(9);
  });

  it('lists released descendants for recall, reaches jars of child cultures, and leaves ended jars alone', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const culture = await jarFixtures.culture();
    const child = await jarFixtures.culture('released', culture.id);
    const session = await jarFixtures.session();
    const base = {
      sessionId: session.id,
      grainId: await jarFixtures.grainId('oats'),
      inoculatedAt: '2026-05-04T10:30:00Z',
    };
    const [sold, binned, kept] = await makeJars(tech, { ...base, count: 3, cultureId: culture.id });
    const [fromChild] = await makeJars(tech, { ...base, count: 1, cultureId: child.id });
    await jarEvent(tech, sold!.id, { type: 'colonised', at: '2026-05-18T08:00:00Z' }).expect(201);
    await jarEvent(tech, sold!.id, {
      type: 'released',
      releasedTo: 'customer',
      releasedToWho: 'Invented Growers Ltd',
      at: '2026-05-20T09:00:00Z',
    }).expect(201);
    await jarEvent(tech, binned!.id, { type: 'discarded', reason: 'cracked jar' }).expect(201);

    const res = await hold(sup, `culture/${culture.id}`);
    expect(res.status).toBe(200);
    expect([...holdOf(res).held].sort()).toEqual([kept!.label, fromChild!.label].sort());
    expect(holdOf(res).recall).toEqual([
      { label: sold!.label, releasedTo: 'customer', releasedToWho: 'Invented Growers Ltd', releasedOn: '2026-05-20' },
    ]);
    expect(holdOf(res).unchanged).toEqual([{ label: binned!.label, status: 'discarded' }]);

    const tree = (await sup.agent.get(`/api/lineage/culture/${culture.id}`)).body as Tree;
    const childNode = tree.children.find((c) => c.node.kind === 'culture')!;
    expect(childNode.node.code).toBe(child.code);
    expect(childNode.children.map((c) => c.node.label)).toEqual([fromChild!.label]);
  });

  it('holds a jar and what was made from it, not its siblings', async () => {
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const { first, second } = await threeGenerations(tech);
    const res = await hold(sup, `jar/${first[0]!.id}`, 'wet spot on a sibling transfer');
    expect(res.status).toBe(200);
    expect([...holdOf(res).held].sort()).toEqual([first[0]!, second[0]!, second[1]!].map((j) => j.label).sort());
    expect((await dataSource.manager.findOneByOrFail(Jar, { id: first[1]!.id })).status).toBe('incubating');
  });
});
