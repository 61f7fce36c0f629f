import { beforeAll, describe, expect, it } from 'vitest';
import { createTestApp } from '../setup/test-app';
import { anonymousStatuses, sendAs, signedIn, type Client } from '../setup/factories';
import { create, createdRun, cycleCsv, newRun, postLog } from './cook-runs.fixtures';
import { errorOf, issuePath } from '../setup/bodies';

const app = createTestApp();

let tech: Client;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
});

describe('/api/cook-runs guards and validation', () => {
  it('answers 401 without a session', async () => {
    const urls = ['/api/cook-runs', '/api/cook-runs/1', '/api/cook-runs/export.csv'];
    expect(await anonymousStatuses(app, urls)).toEqual([401, 401, 401]);
  });

  it('lets a trainer read but answers 403 to every write', async () => {
    const trainer = await signedIn(app, 'trainer');
    const run = await createdRun(tech, newRun());
    expect((await trainer.agent.get(`/api/cook-runs/${run.id}`)).status).toBe(200);
    expect((await create(trainer, newRun())).status).toBe(403);
    const patch = await sendAs(trainer, 'patch', `/api/cook-runs/${run.id}`, { loadCount: 3 });
    expect(patch.status).toBe(403);
    const upload = await postLog(trainer, run.id, cycleCsv('minute,celsius'));
    expect(upload.status).toBe(403);
  });

  it.each([
    ['minutesAtPressure', { minutesAtPressure: 90.5 }],
    ['minutesAtPressure', { minutesAtPressure: undefined }],
    ['container', { container: undefined }],
    ['cookedOn', { cookedOn: undefined }],
    ['cookedOn', { cookedOn: '2026-02-30' }],
    ['gaugeKPa', { gaugeKPa: -5 }],
    ['code', { code: 'has space' }],
    ['operatorName', { operatorId: 1, operatorName: 'Both Given' }],
  ])('answers 400 naming %s', async (field, over) => {
    const res = await create(tech, newRun(over));
    expect(res.status).toBe(400);
    expect(errorOf(res).issues!.map((i: { path: string }) => i.path)).toContain(field);
  });

  it('answers 400 naming operatorId for an unknown user', async () => {
    const res = await create(tech, newRun({ operatorId: 999999 }));
    expect(res.status).toBe(400);
    expect(issuePath(res)).toBe('operatorId');
  });

  it('answers 400 for a bad sort field and an oversized page', async () => {
    const sort = await tech.agent.get('/api/cook-runs?sort=-vessel');
    expect(sort.status).toBe(400);
    expect(issuePath(sort)).toBe('sort');
    expect(issuePath(await tech.agent.get('/api/cook-runs?pageSize=201'))).toBe('pageSize');
  });

  it('answers 404 for an unknown cook run', async () => {
    expect((await tech.agent.get('/api/cook-runs/999999')).status).toBe(404);
    const patch = await sendAs(tech, 'patch', '/api/cook-runs/999999', { loadCount: 2 });
    expect(patch.status).toBe(404);
    const upload = await postLog(tech, 999999, cycleCsv('minute,celsius'));
    expect(upload.status).toBe(404);
    expect((await tech.agent.get('/api/cook-runs/999999/readings')).status).toBe(404);
  });

  it('answers 409 naming code when the code is taken', async () => {
    const body = newRun();
    expect((await create(tech, body)).status).toBe(201);
    const res = await create(tech, { ...body, vessel: 'Other' });
    expect(res.status).toBe(409);
    expect(issuePath(res)).toBe('code');
  });
});
