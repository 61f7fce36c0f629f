import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { emitIncidentCreated } from '../../server/incidents/incident-events';
import { notifyIncidentCreated } from '../../server/mail/incident-mail.service';
import { registerMailListeners } from '../../server/mail/mail-listeners';
import { SentMail } from '../../server/mail/sent-mail.entity';
import { getLabSettings } from '../../server/settings/settings.service';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { makeCookRun, makeCulture, makeIncident, makeJars, makeSession } from '../setup/lab-rows';
import { mailSettled, mailsTo, mailsWhere } from '../setup/mail-sink';

const app = createTestApp();
type Client = Awaited<ReturnType<typeof signedIn>>;

const optOut = (client: Client, body: Record<string, boolean>) =>
  client.agent.put('/api/mail/preferences').set('X-CSRF-Token', client.token()).send(body).expect(200);

/** Who should get a kind right now: active, addressed, in the roles, not opted out. */
async function eligible(kind: string, roles: string[]): Promise<string[]> {
  const rows: { email: string }[] = await dataSource.query(
    `SELECT u.email AS email FROM users u LEFT JOIN mail_preferences p ON p.userId = u.id AND p.kind = ?
     WHERE u.active = 1 AND u.email IS NOT NULL AND u.email <> '' AND u.role IN (?) AND COALESCE(p.enabled, 1) = 1`,
    [kind, roles],
  );
  return rows.map((r) => r.email.toLowerCase()).sort();
}

describe('/api/mail/preferences', () => {
  it('answers 401 without a session', async () => {
    expect((await supertest(app).get('/api/mail/preferences')).status).toBe(401);
  });

  it('starts with every kind on, saves a change with an audit event, and names a bad field', async () => {
    const tech = await signedIn(app, 'technician');
    const initial = await tech.agent.get('/api/mail/preferences').expect(200);
    expect(initial.body).toEqual({
      'new-incident': true,
      'cluster-alert': true,
      retraining: true,
      'weekly-digest': true,
      'action-assigned': true,
      'action-overdue': true,
    });
    const res = await optOut(tech, { 'weekly-digest': false });
    expect(res.body['weekly-digest']).toBe(false);
    expect((await tech.agent.get('/api/mail/preferences')).body['weekly-digest']).toBe(false);
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'user',
      recordId: String(tech.user.id),
      field: 'mail:weekly-digest',
    });
    expect(audit).toMatchObject({ oldValue: 'true', newValue: 'false' });

    const bad = await tech.agent
      .put('/api/mail/preferences')
      .set('X-CSRF-Token', tech.token())
      .send({ retraining: 'no' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.issues[0].path).toBe('retraining');
    const unknown = await tech.agent.put('/api/mail/preferences').set('X-CSRF-Token', tech.token()).send({ sms: true });
    expect(unknown.status).toBe(400);
  });
});

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
    const row = res.body.items.find(
      (m: { to: string; subject: string }) => m.to === sup.user.email && m.subject.includes(`#${incident.id}`),
    );
    expect(row).toMatchObject({ kind: 'new-incident', status: 'sent', toUserId: sup.user.id });
    const detail = await admin.agent.get(`/api/mail/sent/${row.id}`).expect(200);
    expect(detail.body.text).toContain(jars[0]!.label);
    expect((await admin.agent.get('/api/mail/sent/999999')).status).toBe(404);
    expect((await admin.agent.get('/api/mail/sent?status=lost')).status).toBe(400);
  });
});

describe('mail on a new incident', () => {
  it('notifies every supervisor who wants it, with the incident’s numbers, and nobody who opted out', async () => {
    const sup = await signedIn(app, 'supervisor');
    const quiet = await signedIn(app, 'supervisor');
    const trainer = await signedIn(app, 'trainer');
    await optOut(quiet, { 'new-incident': false });
    const run = await makeCookRun();
    const session = await makeSession({ heldOn: '2024-07-01' });
    const culture = await makeCulture();
    const jars = await makeJars(2, {
      inoculatedOn: '2024-07-01',
      cookRunId: run.id,
      sessionId: session.id,
      cultureId: culture.id,
    });
    const incident = await makeIncident(jars, { foundOn: '2024-07-08', contaminant: 'trichoderma' });

    const outcome = await notifyIncidentCreated(incident.id);
    const subject = `New incident #${incident.id}: green mould (Trichoderma), 2 jars`;
    const recipients = mailsWhere((m) => m.subject === subject)
      .flatMap((m) => m.to)
      .sort();
    expect(recipients).toEqual(await eligible('new-incident', ['supervisor']));
    expect(recipients).toContain(sup.user.email);
    expect(recipients).not.toContain(quiet.user.email);
    expect(recipients).not.toContain(trainer.user.email);
    expect(outcome.newIncident).toEqual({ sent: recipients.length, failed: 0 });

    const mail = mailsTo(sup.user.email!).find((m) => m.subject === subject)!;
    expect(mail.kind).toBe('new-incident');
    expect(mail.text).toContain(
      `Test finder filed incident #${incident.id} on 2024-07-08: green mould (Trichoderma), 2 jars`,
    );
    expect(mail.text).toContain(
      `${jars[0]!.label} — cook run ${run.code}, session ${session.code}, culture ${culture.code}`,
    );
    expect(mail.text).toContain('Do not open contaminated jars indoors');
    expect(mail.html).toContain(`/incidents/${incident.id}`);
  });

  it('sends through the incidents module’s after-commit hook', async () => {
    const sup = await signedIn(app, 'supervisor');
    registerMailListeners();
    const jars = await makeJars(1, { inoculatedOn: '2024-07-15' });
    const incident = await makeIncident(jars, { foundOn: '2024-07-20', contaminant: 'bacterial' });
    const delivered = mailSettled(
      (m) => m.to === sup.user.email && m.subject.startsWith(`New incident #${incident.id}:`),
    );
    emitIncidentCreated({
      id: incident.id,
      contaminant: 'bacterial',
      severity: 'medium',
      stage: 'incubation',
      foundAt: incident.foundAt.toISOString(),
      foundByName: 'Test finder',
      jarLabels: [jars[0]!.label],
    });
    expect((await delivered).status).toBe('sent');
    const got = mailsWhere(
      (m) => m.to.includes(sup.user.email!) && m.subject.startsWith(`New incident #${incident.id}:`),
    );
    expect(got.map((m) => m.subject)).toEqual([`New incident #${incident.id}: bacterial (wet spot), 1 jar`]);
  });

  it('sends nothing for imported history', async () => {
    const jars = await makeJars(1, { inoculatedOn: '2024-07-15' });
    const incident = await makeIncident(jars, { foundOn: '2024-07-20', imported: true });
    const outcome = await notifyIncidentCreated(incident.id);
    expect(outcome).toEqual({ newIncident: { sent: 0, failed: 0 }, clusters: [] });
  });

  it('records a failed send without throwing', async () => {
    const { config } = await import('../../server/core/config');
    const { closeMailTransport } = await import('../../server/mail/mail-transport');
    const sup = await signedIn(app, 'supervisor');
    const port = config().SMTP_PORT;
    const jars = await makeJars(1, { inoculatedOn: '2024-07-22' });
    const incident = await makeIncident(jars, { foundOn: '2024-07-29' });
    closeMailTransport();
    config().SMTP_PORT = 1; // nothing listens on port 1
    try {
      const outcome = await notifyIncidentCreated(incident.id);
      expect(outcome.newIncident.sent).toBe(0);
      expect(outcome.newIncident.failed).toBeGreaterThan(0);
    } finally {
      closeMailTransport();
      config().SMTP_PORT = port;
    }
    const row = await dataSource.manager.findOneBy(SentMail, { toUserId: sup.user.id, kind: 'new-incident' });
    expect(row?.status).toBe('failed');
    expect(row?.error).toBeTruthy();
  });
});

describe('cluster alerts', () => {
  let settings: { clusterIncidents: number; clusterDays: number };
  beforeAll(async () => {
    settings = await getLabSettings();
  });

  // Every supervisor and trainer that other files of this worker made is mailed six times over, one
  // message at a time: the longer budget is for that much work on a busy machine, not a timing check.
  it('alerts supervisors and trainers once when N incidents from one cook run fall within D days', async () => {
    expect(settings).toMatchObject({ clusterIncidents: 3, clusterDays: 7 });
    const sup = await signedIn(app, 'supervisor');
    const trainer = await signedIn(app, 'trainer');
    const quiet = await signedIn(app, 'trainer');
    await optOut(quiet, { 'cluster-alert': false });
    const run = await makeCookRun(60);
    const incidents = [];
    // Each jar from its own session and culture, so only the cook run is shared.
    for (const [i, foundOn] of ['2024-08-05', '2024-08-07', '2024-08-11', '2024-08-11'].entries()) {
      const session = await makeSession({ heldOn: '2024-08-01' });
      const culture = await makeCulture();
      const jars = await makeJars(i === 0 ? 2 : 1, {
        inoculatedOn: '2024-08-01',
        cookRunId: run.id,
        sessionId: session.id,
        cultureId: culture.id,
      });
      incidents.push(await makeIncident(jars, { foundOn, contaminant: 'bacterial' }));
    }
    // A ruled-out incident in the window does not count towards the cluster.
    const ruledOut = await makeIncident(await makeJars(1, { inoculatedOn: '2024-08-01', cookRunId: run.id }), {
      foundOn: '2024-08-06',
      verdict: 'ruled-out',
    });

    expect((await notifyIncidentCreated(incidents[0]!.id)).clusters).toEqual([]);
    expect((await notifyIncidentCreated(ruledOut.id)).clusters).toEqual([]);
    expect((await notifyIncidentCreated(incidents[1]!.id)).clusters).toEqual([]);
    // The third and fourth arrive together: the lock lets exactly one of them alert.
    const outcomes = await Promise.all([
      notifyIncidentCreated(incidents[2]!.id),
      notifyIncidentCreated(incidents[3]!.id),
    ]);
    expect(outcomes.flatMap((o) => o.clusters).map((c) => c.dimension)).toEqual(['cookRun']);

    const subjectStart = `Cluster alert: `;
    const ofRun = (email: string) =>
      mailsTo(email).filter((m) => m.subject.startsWith(subjectStart) && m.subject.includes(run.code));
    expect(ofRun(sup.user.email!)).toHaveLength(1);
    expect(ofRun(trainer.user.email!)).toHaveLength(1);
    expect(ofRun(quiet.user.email!)).toHaveLength(0);
    const all = mailsWhere((m) => m.subject.includes(run.code))
      .flatMap((m) => m.to)
      .sort();
    expect(all).toEqual(await eligible('cluster-alert', ['supervisor', 'trainer']));

    const mail = ofRun(sup.user.email!)[0]!;
    const count = mail.subject.includes('4 incidents') ? 4 : 3;
    expect(mail.subject).toBe(`Cluster alert: ${count} incidents from cook run ${run.code} within 7 days`);
    expect(mail.text).toContain(
      `${count} incidents from cook run ${run.code} were found between 2024-08-05 and 2024-08-11, ${count + 1} jars in all. The lab alerts at 3 incidents within 7 days.`,
    );
    expect(mail.text).toContain(`#${incidents[0]!.id}`);
    expect(mail.text).not.toContain(`#${ruledOut.id} `);
    expect(mail.text).toContain('sterilisation cycle');

    // A later incident that extends the same cluster does not mail again.
    const later = await makeIncident(await makeJars(1, { inoculatedOn: '2024-08-01', cookRunId: run.id }), {
      foundOn: '2024-08-12',
    });
    expect((await notifyIncidentCreated(later.id)).clusters).toEqual([]);
    expect(ofRun(sup.user.email!)).toHaveLength(1);
  }, 180_000);

  it('does not alert when the incidents are spread wider than D days', async () => {
    const culture = await makeCulture();
    const outcomes = [];
    for (const foundOn of ['2024-09-02', '2024-09-09', '2024-09-16']) {
      const jars = await makeJars(1, { inoculatedOn: '2024-08-26', cultureId: culture.id });
      outcomes.push(await notifyIncidentCreated((await makeIncident(jars, { foundOn })).id));
    }
    expect(outcomes.flatMap((o) => o.clusters)).toEqual([]);
  });
});
