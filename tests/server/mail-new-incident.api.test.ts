import { describe, expect, it } from 'vitest';
import { dataSource } from '../../server/db/data-source';
import { emitIncidentCreated } from '../../server/incidents/incident-events';
import { notifyIncidentCreated } from '../../server/mail/incident-mail.service';
import { registerMailListeners } from '../../server/mail/mail-listeners';
import { SentMail } from '../../server/mail/sent-mail.entity';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { makeCookRun, makeCulture, makeIncident, makeJars, makeSession } from '../setup/lab-rows';
import { mailSettled, mailsTo, mailsWhere } from '../setup/mail-sink';
import { eligible, optOut } from './mail.fixtures';

const app = createTestApp();

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
