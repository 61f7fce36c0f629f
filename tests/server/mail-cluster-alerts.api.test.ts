import { beforeAll, describe, expect, it } from 'vitest';
import { notifyIncidentCreated } from '../../server/mail/incident-mail.service';
import { getLabSettings } from '../../server/settings/settings.service';
import { createTestApp } from '../setup/test-app';
import { signedIn } from '../setup/factories';
import { makeCookRun, makeCulture, makeIncident, makeJars, makeSession } from '../setup/lab-rows';
import { mailsTo, mailsWhere } from '../setup/mail-sink';
import { eligible, optOut } from './mail.fixtures';

const app = createTestApp();

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
