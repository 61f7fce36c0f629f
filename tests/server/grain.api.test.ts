import supertest from 'supertest';
import { z } from 'zod';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { pageOf } from '../../shared/schemas/common';
import { grainLotDetailSchema, grainLotSchema, grainSchema, prepBatchSchema } from '../../shared/schemas/grain';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();
type Client = Awaited<ReturnType<typeof signedIn>>;

let tech: Client;
let ryeId: number;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
  const grains = bodyOf(await tech.agent.get('/api/grains'), z.array(grainSchema));
  ryeId = grains.find((g) => g.name === 'rye')!.id;
});

const post = (client: Client, url: string, body: Record<string, unknown>) =>
  client.agent.post(url).set('X-CSRF-Token', client.token()).send(body);
const lotPageSchema = pageOf(grainLotSchema);
const batchPageSchema = pageOf(prepBatchSchema);
const createdLot = async (body: Record<string, unknown>) =>
  bodyOf(await post(tech, '/api/grain-lots', body), grainLotSchema);
const createdBatch = async (body: Record<string, unknown>) =>
  bodyOf(await post(tech, '/api/prep-batches', body), prepBatchSchema);
const newLot = (over: Record<string, unknown> = {}) => ({
  grainId: ryeId,
  supplierLotCode: uniqueName('SUP'),
  receivedOn: '2026-02-01',
  ...over,
});
const newBatch = (grainLotId: number, over: Record<string, unknown> = {}) => ({
  code: uniqueName('PB'),
  grainLotId,
  preparedOn: '2026-02-03',
  soakHours: 18,
  simmerMinutes: 12,
  drainMinutes: 45,
  notes: 'a little wet',
  ...over,
});

describe('/api/grains', () => {
  it('answers 401 without a session', async () => {
    const anon = supertest(app);
    for (const url of [
      '/api/grains',
      '/api/grain-lots',
      '/api/grain-lots/1',
      '/api/prep-batches',
      '/api/prep-batches/1',
    ]) {
      expect((await anon.get(url)).status).toBe(401);
    }
  });

  it('lists the default grain list to any signed-in role', async () => {
    const trainer = await signedIn(app, 'trainer');
    const res = await trainer.agent.get('/api/grains');
    expect(res.status).toBe(200);
    const names = bodyOf(res, z.array(grainSchema)).map((g) => g.name);
    const defaults = ['brown rice', 'maize', 'millet', 'oats', 'rye', 'sorghum', 'wheat'];
    expect(names.filter((n) => defaults.includes(n))).toEqual(defaults);
  });

  it('lets only an admin add a grain, refusing a name already listed in any case', async () => {
    const supervisor = await signedIn(app, 'supervisor');
    expect((await post(supervisor, '/api/grains', { name: 'spelt' })).status).toBe(403);
    const admin = await signedIn(app, 'admin');
    const name = uniqueName('spelt');
    const res = await post(admin, '/api/grains', { name });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name, active: true });
    const grain = bodyOf(res, grainSchema);
    const clash = await post(admin, '/api/grains', { name: 'RYE' });
    expect(clash.status).toBe(409);
    expect(issuePath(clash)).toBe('name');
    const bad = await post(admin, '/api/grains', { name: 'x' });
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('name');
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'grain',
      recordId: String(grain.id),
    });
    expect(audit?.action).toBe('create');
  });
});

describe('/api/grain-lots', () => {
  it('creates a lot, audits it and answers 403 to a trainer', async () => {
    const trainer = await signedIn(app, 'trainer');
    expect((await post(trainer, '/api/grain-lots', newLot())).status).toBe(403);
    const res = await post(tech, '/api/grain-lots', newLot());
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ grain: 'rye', receivedOn: '2026-02-01', prepBatchCount: 0 });
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'grain-lot',
      recordId: String(bodyOf(res, grainLotSchema).id),
    });
    expect(audit?.userName).toBe('Test technician');
  });

  it('answers 400 naming the field, 404 for an unknown lot and 409 naming supplierLotCode', async () => {
    const unknown = await post(tech, '/api/grain-lots', newLot({ grainId: 999999 }));
    expect(unknown.status).toBe(400);
    expect(issuePath(unknown)).toBe('grainId');
    const date = await post(tech, '/api/grain-lots', newLot({ receivedOn: '2026-13-01' }));
    expect(issuePath(date)).toBe('receivedOn');
    expect((await tech.agent.get('/api/grain-lots/999999')).status).toBe(404);
    const body = newLot();
    await post(tech, '/api/grain-lots', body).then((r) => expect(r.status).toBe(201));
    const clash = await post(tech, '/api/grain-lots', body);
    expect(clash.status).toBe(409);
    expect(issuePath(clash)).toBe('supplierLotCode');
  });

  it('pages lots and shows a lot with its prep batches', async () => {
    const code = uniqueName('PAGED');
    for (const day of ['2026-01-01', '2026-01-03', '2026-01-02']) {
      await post(tech, '/api/grain-lots', newLot({ supplierLotCode: `${code}-${day}`, receivedOn: day }));
    }
    const res = await tech.agent.get(`/api/grain-lots?q=${code}&sort=receivedOn&pageSize=2`);
    expect(res.body).toMatchObject({ total: 3, page: 1, pageSize: 2 });
    const page = bodyOf(res, lotPageSchema);
    expect(page.items.map((l) => l.receivedOn)).toEqual(['2026-01-01', '2026-01-02']);
    const lot = page.items[0]!;
    await post(tech, '/api/prep-batches', newBatch(lot.id));
    const detail = bodyOf(await tech.agent.get(`/api/grain-lots/${lot.id}`), grainLotDetailSchema);
    expect(detail.prepBatchCount).toBe(1);
    expect(detail.prepBatches).toHaveLength(1);
    expect(detail.prepBatches[0]).toMatchObject({ grain: 'rye', supplierLotCode: lot.supplierLotCode });
  });
});

describe('/api/prep-batches', () => {
  it('creates a batch with its prep times and audits it', async () => {
    const lot = await createdLot(newLot());
    const res = await post(tech, '/api/prep-batches', newBatch(lot.id));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      grainLotId: lot.id,
      grain: 'rye',
      soakHours: 18,
      simmerMinutes: 12,
      drainMinutes: 45,
    });
    const batch = bodyOf(res, prepBatchSchema);
    expect(bodyOf(await tech.agent.get(`/api/prep-batches/${batch.id}`), prepBatchSchema).code).toBe(batch.code);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'prep-batch',
      recordId: String(batch.id),
    });
    expect(audit?.action).toBe('create');
  });

  it('answers 403 to a trainer, 400 naming the field, 404 and 409 naming code', async () => {
    const trainer = await signedIn(app, 'trainer');
    const lot = await createdLot(newLot());
    expect((await post(trainer, '/api/prep-batches', newBatch(lot.id))).status).toBe(403);
    const noLot = await post(tech, '/api/prep-batches', newBatch(999999));
    expect(issuePath(noLot)).toBe('grainLotId');
    const soak = await post(tech, '/api/prep-batches', newBatch(lot.id, { soakHours: 200 }));
    expect(soak.status).toBe(400);
    expect(issuePath(soak)).toBe('soakHours');
    const simmer = await post(tech, '/api/prep-batches', newBatch(lot.id, { simmerMinutes: 12.5 }));
    expect(issuePath(simmer)).toBe('simmerMinutes');
    expect((await tech.agent.get('/api/prep-batches/999999')).status).toBe(404);
    const body = newBatch(lot.id);
    await post(tech, '/api/prep-batches', body).then((r) => expect(r.status).toBe(201));
    const clash = await post(tech, '/api/prep-batches', body);
    expect(clash.status).toBe(409);
    expect(issuePath(clash)).toBe('code');
  });

  it('filters by lot and by grain name or id', async () => {
    const sorghumId = bodyOf(await tech.agent.get('/api/grains'), z.array(grainSchema)).find(
      (g) => g.name === 'sorghum',
    )!.id;
    const ryeLot = await createdLot(newLot());
    const sorghumLot = await createdLot(newLot({ grainId: sorghumId }));
    const tag = uniqueName('F');
    const a = await createdBatch(newBatch(ryeLot.id, { code: `${tag}-a` }));
    const b = await createdBatch(newBatch(sorghumLot.id, { code: `${tag}-b` }));
    const byLot = await tech.agent.get(`/api/prep-batches?grainLotId=${ryeLot.id}`);
    expect(bodyOf(byLot, batchPageSchema).items.map((x) => x.id)).toEqual([a.id]);
    const byName = await tech.agent.get(`/api/prep-batches?q=${tag}&grain=Sorghum`);
    expect(bodyOf(byName, batchPageSchema).items.map((x) => x.id)).toEqual([b.id]);
    const byId = await tech.agent.get(`/api/prep-batches?q=${tag}&grain=${ryeId}`);
    expect(bodyOf(byId, batchPageSchema).items.map((x) => x.id)).toEqual([a.id]);
    const unknown = await tech.agent.get('/api/prep-batches?grain=quinoa-not-listed');
    expect(unknown.status).toBe(400);
    expect(issuePath(unknown)).toBe('grain');
  });
});
