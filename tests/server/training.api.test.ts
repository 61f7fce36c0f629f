import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { createTestApp } from '../setup/test-app';
import { signedIn, uniqueName } from '../setup/factories';
import { makeIncident, makeJars, makeSession } from '../setup/lab-rows';
import { mailsTo } from '../setup/mail-sink';
import { bodyOf, issuePath } from '../setup/bodies';
import { pageOf } from '../../shared/schemas/common';
import { operatorsSchema, retrainRequestSchema, trainingRecordSchema } from '../../shared/schemas/training';

const app = createTestApp();
type Client = Awaited<ReturnType<typeof signedIn>>;

const steps = [
  { text: 'Wipe lids with 70 % isopropyl alcohol and let them dry.' },
  { text: 'Flame the needle until it glows; let it cool.' },
];

async function procedure(trainer: Client) {
  const res = await trainer.agent
    .post('/api/procedures')
    .set('X-CSRF-Token', trainer.token())
    .send({ code: uniqueName('T'), title: 'Sterile technique', steps })
    .expect(201);
  return res.body as { id: number; currentVersionId: number };
}

const train = (client: Client, userId: number, procedureVersionId: number, trainedOn = '2026-01-12') =>
  client.agent
    .post('/api/training-records')
    .set('X-CSRF-Token', client.token())
    .send({ userId, procedureVersionId, trainedOn });

describe('training: role checks', () => {
  it.each(['/api/training-records', '/api/training/operators', '/api/training/retrain-requests'])(
    'answers 401 to GET %s without a session',
    async (url) => {
      expect((await supertest(app).get(url)).status).toBe(401);
    },
  );

  it.each(['technician', 'supervisor'] as const)('refuses to let a %s write training records', async (role) => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await procedure(trainer);
    const client = await signedIn(app, role);
    expect((await train(client, client.user.id, proc.currentVersionId)).status).toBe(403);
  });

  it('keeps the operators view and retraining requests from technicians', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await procedure(trainer);
    const tech = await signedIn(app, 'technician');
    expect((await tech.agent.get('/api/training/operators')).status).toBe(403);
    const res = await tech.agent
      .post('/api/training/retrain-requests')
      .set('X-CSRF-Token', tech.token())
      .send({ userId: tech.user.id, procedureVersionId: proc.currentVersionId, reason: 'x' });
    expect(res.status).toBe(403);
  });

  it('lets an admin record training and a supervisor see operators', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await procedure(trainer);
    const admin = await signedIn(app, 'admin');
    const tech = await signedIn(app, 'technician');
    expect((await train(admin, tech.user.id, proc.currentVersionId)).status).toBe(201);
    const sup = await signedIn(app, 'supervisor');
    expect((await sup.agent.get(`/api/training/operators?procedureId=${proc.id}`)).status).toBe(200);
  });
});

describe('training: records', () => {
  it('answers 400 naming trainedOn and 404 for an unknown person or version', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await procedure(trainer);
    const bad = await train(trainer, trainer.user.id, proc.currentVersionId, '12/01/2026');
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('trainedOn');
    expect((await train(trainer, 999999, proc.currentVersionId)).status).toBe(404);
    expect((await train(trainer, trainer.user.id, 999999)).status).toBe(404);
  });

  it('records who was trained on which version by whom, and shows a technician only their own', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await procedure(trainer);
    const tech = await signedIn(app, 'technician');
    const other = await signedIn(app, 'technician');
    const res = await train(trainer, tech.user.id, proc.currentVersionId);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      userId: tech.user.id,
      personName: 'Test technician',
      version: 1,
      trainerId: trainer.user.id,
      trainerName: 'Test trainer',
      trainedOn: '2026-01-12',
    });
    expect(
      await dataSource.manager.existsBy(AuditEvent, {
        recordType: 'training-record',
        recordId: String(bodyOf(res, trainingRecordSchema).id),
      }),
    ).toBe(true);
    await train(trainer, other.user.id, proc.currentVersionId).expect(201);

    const mine = await tech.agent.get(`/api/training-records?procedureId=${proc.id}`).expect(200);
    expect(bodyOf(mine, pageOf(trainingRecordSchema)).items.map((r) => r.userId)).toEqual([tech.user.id]);
    const all = await trainer.agent.get(`/api/training-records?procedureId=${proc.id}`).expect(200);
    expect(bodyOf(all, pageOf(trainingRecordSchema)).total).toBe(2);
  });
});

describe('training: operators view', () => {
  it('shows incidents per operator and whether they are trained on the current version', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await procedure(trainer);
    const tech = await signedIn(app, 'technician');
    const session = await makeSession({
      heldOn: '2024-05-06',
      operatorId: tech.user.id,
      versionId: proc.currentVersionId,
    });
    const jars = await makeJars(5, { inoculatedOn: '2024-05-06', sessionId: session.id });
    await makeIncident(jars.slice(0, 2), { foundOn: '2024-05-13' });
    await makeIncident(jars.slice(2, 3), { foundOn: '2024-05-14' });
    await makeIncident(jars.slice(3, 4), { foundOn: '2024-05-14', verdict: 'ruled-out' });
    await train(trainer, tech.user.id, proc.currentVersionId).expect(201);

    const row = async () => {
      const res = await trainer.agent.get(`/api/training/operators?procedureId=${proc.id}`).expect(200);
      const view = bodyOf(res, operatorsSchema);
      return { procedure: view.procedure, me: view.operators.find((o) => o.userId === tech.user.id) };
    };
    const first = await row();
    expect(first.me).toMatchObject({
      sessions: 1,
      jars: 5,
      contaminatedJars: 3,
      incidents: 2,
      trainedVersion: 1,
      trainedOnCurrent: true,
    });

    await trainer.agent
      .post(`/api/procedures/${proc.id}/versions`)
      .set('X-CSRF-Token', trainer.token())
      .send({
        changeNote: 'Added a cooling step.',
        steps: [...steps, { text: 'Let the needle cool before the port.' }],
      })
      .expect(201);
    const second = await row();
    expect(second.procedure!.currentVersion).toBe(2);
    expect(second.me).toMatchObject({ trainedVersion: 1, trainedOnCurrent: false });
    expect((await trainer.agent.get('/api/training/operators?procedureId=999999')).status).toBe(404);
  });
});

describe('training: retraining requests', () => {
  it('mails the person the reason and the steps, and closes the request when they are trained', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await procedure(trainer);
    const tech = await signedIn(app, 'technician');
    const sup = await signedIn(app, 'supervisor');
    const res = await sup.agent.post('/api/training/retrain-requests').set('X-CSRF-Token', sup.token()).send({
      userId: tech.user.id,
      procedureVersionId: proc.currentVersionId,
      reason: 'Three port contaminations in session S-17.',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      userId: tech.user.id,
      version: 1,
      requestedById: sup.user.id,
      doneAt: null,
      mailed: true,
    });

    const mails = mailsTo(tech.user.email!);
    expect(mails).toHaveLength(1);
    const mail = mails[0]!;
    expect(mail.subject).toBe('Retraining requested: Sterile technique (version 1)');
    expect(mail.text).toContain('Test supervisor asks you to retrain on “Sterile technique”, version 1.');
    expect(mail.text).toContain('Reason: Three port contaminations in session S-17.');
    expect(mail.text).toContain('The 2 steps of version 1:');
    expect(mail.text).toContain('2. Flame the needle until it glows; let it cool.');
    expect(mail.text).toContain('Alcohol and flame');
    expect(mail.html).toContain('<li>1. Wipe lids with 70 % isopropyl alcohol and let them dry.</li>');

    const open = await tech.agent.get('/api/training/retrain-requests?open=true').expect(200);
    expect(bodyOf(open, pageOf(retrainRequestSchema)).items.map((r) => r.id)).toEqual([
      bodyOf(res, retrainRequestSchema).id,
    ]);
    await train(trainer, tech.user.id, proc.currentVersionId).expect(201);
    const after = await tech.agent.get('/api/training/retrain-requests?open=true').expect(200);
    expect(bodyOf(after, pageOf(retrainRequestSchema)).total).toBe(0);
  });

  it('sends nothing to a person who opted out of retraining mail, but still records the request', async () => {
    const trainer = await signedIn(app, 'trainer');
    const proc = await procedure(trainer);
    const tech = await signedIn(app, 'technician');
    await tech.agent
      .put('/api/mail/preferences')
      .set('X-CSRF-Token', tech.token())
      .send({ retraining: false })
      .expect(200);
    const res = await trainer.agent
      .post('/api/training/retrain-requests')
      .set('X-CSRF-Token', trainer.token())
      .send({ userId: tech.user.id, procedureVersionId: proc.currentVersionId, reason: 'Refresher.' });
    expect(res.status).toBe(201);
    expect(bodyOf(res, retrainRequestSchema).mailed).toBe(false);
    expect(mailsTo(tech.user.email!)).toHaveLength(0);
  });

  it('answers 400 naming reason and 404 for an unknown version', async () => {
    const trainer = await signedIn(app, 'trainer');
    const tech = await signedIn(app, 'technician');
    const proc = await procedure(trainer);
    const t = trainer.token();
    const bad = await trainer.agent
      .post('/api/training/retrain-requests')
      .set('X-CSRF-Token', t)
      .send({ userId: tech.user.id, procedureVersionId: proc.currentVersionId, reason: ' ' });
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('reason');
    const missing = await trainer.agent
      .post('/api/training/retrain-requests')
      .set('X-CSRF-Token', t)
      .send({ userId: tech.user.id, procedureVersionId: 999999, reason: 'x' });
    expect(missing.status).toBe(404);
  });
});
