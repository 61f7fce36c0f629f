import supertest from 'supertest';
import { z } from 'zod';
import { afterAll, describe, expect, it } from 'vitest';
import type { RatesDto } from '../../shared/schemas/analysis-rates';
import { labSettingsSchema, type LabSettingsDto } from '../../shared/schemas/settings';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { config } from '../../server/core/config';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { bodyOf, errorOf } from '../setup/bodies';
import { rebuildTallies } from '../../server/tallies/tallies.service';

const app = createTestApp();
/** The settings as read: the editable ones, when they changed, and the lab's time zone. */
const labSettingsReadSchema = labSettingsSchema.extend({ updatedAt: z.string(), timeZone: z.string() });
const defaults = {
  cookBucketEdges: [60, 90, 120, 180],
  lethalityTarget: 15,
  observationWindowDays: 21,
  clusterIncidents: 3,
  clusterDays: 7,
  // DESIGN §4.4 and §4.6; 5 % and the container minutes are common practice (shared/TRADE.md §1).
  contaminationTarget: 0.05,
  containerMinutes: { '1 L jar': 90, '2 L jar': 120, '3 kg bag': 150 },
};

async function restoreDefaults() {
  await dataSource.query(
    'UPDATE lab_settings SET cookBucketEdges = ?, lethalityTarget = ?, observationWindowDays = ?, clusterIncidents = ?, clusterDays = ?, contaminationTarget = ?, containerMinutes = ? WHERE id = 1',
    [
      JSON.stringify(defaults.cookBucketEdges),
      defaults.lethalityTarget,
      defaults.observationWindowDays,
      defaults.clusterIncidents,
      defaults.clusterDays,
      defaults.contaminationTarget,
      JSON.stringify(defaults.containerMinutes),
    ],
  );
}
afterAll(restoreDefaults);

describe('/api/settings', () => {
  it('answers 401 without a session', async () => {
    expect((await supertest(app).get('/api/settings')).status).toBe(401);
  });

  it.each(['technician', 'supervisor', 'trainer', 'admin'] as const)('lets a %s read the settings', async (role) => {
    await restoreDefaults();
    const client = await signedIn(app, role);
    const res = await client.agent.get('/api/settings');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject(defaults);
    // The lab's clock for greetings, "today" and dates on screen: read-only, from LAB_TIME_ZONE.
    expect(bodyOf(res, labSettingsReadSchema).timeZone).toBe(config().LAB_TIME_ZONE);
  });

  it.each(['technician', 'supervisor', 'trainer'] as const)('answers 403 to a %s changing them', async (role) => {
    const client = await signedIn(app, role);
    const res = await client.agent
      .patch('/api/settings')
      .set('X-CSRF-Token', client.token())
      .send({ lethalityTarget: 20 });
    expect(res.status).toBe(403);
  });

  it('answers 403 without a CSRF token', async () => {
    const admin = await signedIn(app, 'admin');
    expect((await admin.agent.patch('/api/settings').send({ lethalityTarget: 20 })).status).toBe(403);
  });

  it.each([
    [{ cookBucketEdges: [90, 60] }, 'cookBucketEdges'],
    [{ cookBucketEdges: [] }, 'cookBucketEdges'],
    [{ cookBucketEdges: [60.5] }, 'cookBucketEdges.0'],
    [{ lethalityTarget: 0 }, 'lethalityTarget'],
    [{ observationWindowDays: 2.5 }, 'observationWindowDays'],
    [{ clusterIncidents: 1 }, 'clusterIncidents'],
    [{ clusterDays: 'seven' }, 'clusterDays'],
    [{ contaminationTarget: 1.5 }, 'contaminationTarget'],
    [{ containerMinutes: { '1 L jar': 0 } }, 'containerMinutes.1 L jar'],
    [{ containerMinutes: { '1 L jar': 'long' } }, 'containerMinutes.1 L jar'],
    [{ colour: 'green' }, ''],
    [{}, ''],
  ])('answers 400 naming the field for %j', async (body, field) => {
    const admin = await signedIn(app, 'admin');
    const res = await admin.agent.patch('/api/settings').set('X-CSRF-Token', admin.token()).send(body);
    expect(res.status).toBe(400);
    expect(errorOf(res).issues!.map((i: { path: string }) => i.path)).toContain(field);
  });

  it('changes settings in one transaction with an audit event per field, and the buckets follow', async () => {
    await restoreDefaults();
    const admin = await signedIn(app, 'admin');
    const res = await admin.agent
      .patch('/api/settings')
      .set('X-CSRF-Token', admin.token())
      .send({ cookBucketEdges: [45, 100], lethalityTarget: 12.5, observationWindowDays: 21 });
    expect(res.status).toBe(200);
    expect(res.body as LabSettingsDto).toMatchObject({
      cookBucketEdges: [45, 100],
      lethalityTarget: 12.5,
      observationWindowDays: 21,
    });
    const audits = await dataSource.manager.findBy(AuditEvent, { recordType: 'lab-settings', userName: 'Test admin' });
    const fields = audits
      .slice(-2)
      .map((a) => a.field)
      .sort();
    expect(fields).toEqual(['cookBucketEdges', 'lethalityTarget']);
    expect(audits.find((a) => a.field === 'cookBucketEdges' && a.newValue === '[45,100]')?.oldValue).toBe(
      '[60,90,120,180]',
    );

    const label = uniqueName('PX-SET');
    await dataSource.query('INSERT INTO cook_runs (code, minutesAtPressure) VALUES (?, 99)', [label]);
    const [run] = await dataSource.query<{ id: number }[]>('SELECT id FROM cook_runs WHERE code = ?', [label]);
    const [grain] = await dataSource.query<{ id: number }[]>("SELECT id FROM grains WHERE name = 'rye'");
    await dataSource.query(
      "INSERT INTO jars (label, grainId, cookRunId, status, inoculatedAt, inoculatedOn) VALUES (?, ?, ?, 'colonised', '1999-03-03 12:00:00', '1999-03-03')",
      [label, grain!.id, run!.id],
    );
    // Written beside the jars module: counted as the module would count it.
    await rebuildTallies();
    const rates = (await admin.agent.get('/api/analysis/rates?by=cookMinutes&from=1999-03-03&to=1999-03-03'))
      .body as RatesDto;
    expect(rates.rows.map((r) => r.level)).toEqual(['45-99']);
  });
});
