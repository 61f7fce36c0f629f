import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { QueueDto } from '../../shared/schemas/queue';
import { localDate } from '../../server/core/local-time';
import { dataSource } from '../../server/db/data-source';
import { ClusterAlert } from '../../server/mail/cluster-alert.entity';
import { createTestApp } from '../setup/test-app';
import { sendAs, signedIn, uniqueName, type Client } from '../setup/factories';
import { makeCookRun, makeIncident, makeJars } from '../setup/lab-rows';
import { correctiveActionSchema } from '../../shared/schemas/corrective-actions';
import { bodyOf } from '../setup/bodies';

const app = createTestApp();
// Every active supervisor is mailed on each new incident: the people made here leave when the file ends,
// so later files in this worker's database do not mail them too.
afterAll(() =>
  dataSource.query("UPDATE users SET active = 0 WHERE email LIKE '%@example.invalid' AND displayName LIKE 'Test %'"),
);
const daysFrom = (days: number) => localDate(new Date(Date.now() + days * 86_400_000));

let sup: Client;
beforeAll(async () => {
  sup = await signedIn(app, 'supervisor');
});

const queue = async () => (await sup.agent.get('/api/queue').expect(200)).body as QueueDto;

describe('GET /api/queue', () => {
  it('answers 401 without a session and 403 to other roles', async () => {
    expect((await supertest(app).get('/api/queue')).status).toBe(401);
    for (const role of ['technician', 'trainer', 'admin'] as const) {
      expect((await (await signedIn(app, role)).agent.get('/api/queue')).status).toBe(403);
    }
  });

  it('lists open incidents oldest first and overdue actions, each with what its link needs', async () => {
    // Other files in this worker's database leave open incidents behind; only this test's two should wait.
    await dataSource.query("UPDATE incidents SET status = 'closed' WHERE status <> 'closed'");
    const jars = await makeJars(2, { inoculatedOn: daysFrom(-12) });
    const older = await makeIncident([jars[0]!], { foundOn: daysFrom(-400) });
    const newer = await makeIncident([jars[1]!], { foundOn: daysFrom(-1) });
    const what = uniqueName('Replace the lid filters');
    const action = await sendAs(sup, 'post', `/api/incidents/${newer.id}/actions`, {
      what,
      ownerName: 'Someone',
      dueOn: daysFrom(-2),
    }).expect(201);
    const q = await queue();
    const ids = q.incidentsToReview.items.map((i) => i.id);
    expect(ids[0]).toBe(older.id);
    expect(q.incidentsToReview.total).toBeGreaterThanOrEqual(2);
    expect(q.actionsOverdue.items.find((a) => a.id === bodyOf(action, correctiveActionSchema).id)).toMatchObject({
      incidentId: newer.id,
      what,
    });
  });

  it('lists recent cook runs below their target', async () => {
    const run = await makeCookRun(45);
    await dataSource.query("UPDATE cook_runs SET container = '1 L jar', cookedOn = ? WHERE id = ?", [
      daysFrom(-3),
      run.id,
    ]);
    const q = await queue();
    expect(q.runsBelowTarget.items.find((r) => r.id === run.id)).toMatchObject({
      minutesAtPressure: 45,
      minimumMinutes: 90,
      judgedBy: 'minutes',
    });
  });

  it('keeps a cluster alert in the queue until a supervisor marks it looked at', async () => {
    // A run of its own and long-past dates, so no other file's incidents extend this alert.
    const run = await makeCookRun();
    // Voided, so the incident the alert points at shows in no list.
    const [jar] = await makeJars(1, { inoculatedOn: '2000-12-20', cookRunId: run.id });
    const trigger = await makeIncident([jar!], { foundOn: '2001-01-01', voided: true });
    const alert = await dataSource.manager.save(
      dataSource.manager.create(ClusterAlert, {
        dimension: 'cookRun',
        levelId: run.id,
        levelCode: run.code,
        firstFoundOn: '2001-01-01',
        lastFoundOn: '2001-01-03',
        incidentCount: 3,
        triggeredByIncidentId: trigger.id,
      }),
    );
    expect((await queue()).clusterAlerts.items.map((a) => a.id)).toContain(alert.id);
    const tech = await signedIn(app, 'technician');
    expect((await sendAs(tech, 'post', `/api/queue/cluster-alerts/${alert.id}/seen`)).status).toBe(403);
    expect((await sendAs(sup, 'post', '/api/queue/cluster-alerts/999999/seen')).status).toBe(404);
    await sendAs(sup, 'post', `/api/queue/cluster-alerts/${alert.id}/seen`).expect(204);
    expect((await queue()).clusterAlerts.items.map((a) => a.id)).not.toContain(alert.id);
    const row = await dataSource.manager.findOneByOrFail(ClusterAlert, { id: alert.id });
    expect(row.seenByName).toBe('Test supervisor');
  });
});
