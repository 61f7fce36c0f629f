import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { notifyIncidentCreated } from '../../server/mail/incident-mail.service';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { makeIncident, makeJars } from '../setup/lab-rows';
import { pageOf } from '../../shared/schemas/common';
import { sentMailDetailSchema, sentMailSchema } from '../../shared/schemas/mail';
import { bodyOf } from '../setup/bodies';

const app = createTestApp();

describe('/api/mail/sent', () => {
  it('answers 401 without a session and 403 to every role but admin', async () => {
    expect((await supertest(app).get('/api/mail/sent')).status).toBe(401);
    for (const role of ['technician', 'supervisor', 'trainer'] as const) {
      const client = await signedIn(app, role);
      expect((await client.agent.get('/api/mail/sent')).status).toBe(403);
      expect((await client.agent.post('/api/mail/digest').set('X-CSRF-Token', client.token())).status).toBe(403);
    }
  });

  it('lists what was sent, paged, with one message readable in full', async () => {
    const admin = await signedIn(app, 'admin');
    const sup = await signedIn(app, 'supervisor');
    const jars = await makeJars(1, { inoculatedOn: '2024-06-03' });
    const incident = await makeIncident(jars, { foundOn: '2024-06-10' });
    await notifyIncidentCreated(incident.id);
    const res = await admin.agent.get('/api/mail/sent?kind=new-incident&pageSize=200').expect(200);
    const row = bodyOf(res, pageOf(sentMailSchema)).items.find(
      (m) => m.to === sup.user.email && m.subject.includes(`#${incident.id}`),
    );
    expect(row).toMatchObject({ kind: 'new-incident', status: 'sent', toUserId: sup.user.id });
    const detail = await admin.agent.get(`/api/mail/sent/${row!.id}`).expect(200);
    expect(bodyOf(detail, sentMailDetailSchema).text).toContain(jars[0]!.label);
    expect((await admin.agent.get('/api/mail/sent/999999')).status).toBe(404);
    expect((await admin.agent.get('/api/mail/sent?status=lost')).status).toBe(400);
  });
});
