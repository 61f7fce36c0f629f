import supertest from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { actionPageSchema, correctiveActionSchema } from '../../shared/schemas/corrective-actions';
import { localDate } from '../../server/core/local-time';
import { dataSource } from '../../server/db/data-source';
import { sendOverdueReminders } from '../../server/mail/action-mail.service';
import { createTestApp } from '../setup/test-app';
import { sendAs, signedIn, uniqueName, type Client } from '../setup/factories';
import { makeIncident, makeJars } from '../setup/lab-rows';
import { mailsTo, readMailSink } from '../setup/mail-sink';
import { bodyOf, issuePath } from '../setup/bodies';

const app = createTestApp();
// Every active supervisor is mailed on each new incident: the people made here leave when the file ends,
// so later files in this worker's database do not mail them too.
afterAll(() =>
  dataSource.query("UPDATE users SET active = 0 WHERE email LIKE '%@example.invalid' AND displayName LIKE 'Test %'"),
);
const today = localDate(new Date());
const daysFrom = (days: number) => localDate(new Date(Date.now() + days * 86_400_000));

let sup: Client;
let tech: Client;
let incidentId: number;
beforeAll(async () => {
  sup = await signedIn(app, 'supervisor');
  tech = await signedIn(app, 'technician');
  const jars = await makeJars(1, { inoculatedOn: daysFrom(-10) });
  incidentId = (await makeIncident(jars, { foundOn: daysFrom(-2) })).id;
});

const addAction = (body: Record<string, unknown>) =>
  sendAs(sup, 'post', `/api/incidents/${incidentId}/actions`, { what: uniqueName('Check the gauge'), ...body });
const list = async (client: Client, query: string) =>
  bodyOf(await client.agent.get(`/api/corrective-actions?${query}`).expect(200), actionPageSchema);

describe('corrective action owners and mail', () => {
  it('mails a user owner at their account address on assignment', async () => {
    const res = await addAction({ ownerId: tech.user.id, dueOn: daysFrom(5) });
    expect(res.status).toBe(201);
    const mails = mailsTo(tech.user.email!).filter((m) => m.subject.includes(`incident #${incidentId}`));
    expect(mails).toHaveLength(1);
    const action = bodyOf(res, correctiveActionSchema);
    expect(mails[0]!.text).toContain(action.what);
    const row = await dataSource.query<{ assignedMailAt: Date | null }[]>(
      'SELECT assignedMailAt FROM corrective_actions WHERE id = ?',
      [action.id],
    );
    expect(row[0]!.assignedMailAt).not.toBeNull();
  });

  it('keeps a staff owner without an account with their own address and mails it', async () => {
    const email = `${uniqueName('staff')}@example.invalid`;
    const res = await addAction({ ownerName: 'Staff Person', ownerEmail: email, dueOn: daysFrom(3) });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ ownerId: null, ownerName: 'Staff Person', ownerEmail: email });
    expect(mailsTo(email)).toHaveLength(1);
  });

  it('answers 400 naming ownerEmail for a bad address or an address beside a user owner', async () => {
    const bad = await addAction({ ownerName: 'Staff Person', ownerEmail: 'not-an-address', dueOn: today });
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('ownerEmail');
    const both = await addAction({ ownerId: tech.user.id, ownerEmail: 'x@example.invalid', dueOn: today });
    expect(both.status).toBe(400);
    expect(issuePath(both)).toBe('ownerEmail');
  });

  it('reminds the owner of an overdue action once, however often reminders run', async () => {
    const email = `${uniqueName('late')}@example.invalid`;
    const res = await addAction({ ownerName: 'Late Owner', ownerEmail: email, dueOn: daysFrom(-1) });
    expect(bodyOf(res, correctiveActionSchema).overdue).toBe(true);
    const first = await sendOverdueReminders();
    expect(first.reminded).toBeGreaterThanOrEqual(1);
    // Two runs at once, as two app instances would: the lock and the claimed row keep it to one mail.
    await Promise.all([sendOverdueReminders(), sendOverdueReminders()]);
    const overdue = mailsTo(email).filter((m) => m.subject.startsWith('Overdue'));
    expect(overdue).toHaveLength(1);
    expect(readMailSink().filter((m) => m.to.includes(email))).toHaveLength(2);
  });

  it('lets a supervisor send due reminders now and refuses a technician', async () => {
    expect((await sendAs(tech, 'post', '/api/corrective-actions/reminders')).status).toBe(403);
    const res = await sendAs(sup, 'post', '/api/corrective-actions/reminders');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ reminded: 0, failed: 0 });
  });
});

describe('GET /api/corrective-actions', () => {
  it('answers 401 without a session and 400 naming a bad filter', async () => {
    expect((await supertest(app).get('/api/corrective-actions')).status).toBe(401);
    const bad = await tech.agent.get('/api/corrective-actions?state=late');
    expect(bad.status).toBe(400);
    expect(issuePath(bad)).toBe('state');
    const level = await tech.agent.get('/api/corrective-actions?level=CR-1');
    expect(issuePath(level)).toBe('factor');
  });

  it('filters open, overdue, due soon, done, mine, by incident and by factor level, paged on the server', async () => {
    const owner = await signedIn(app, 'technician');
    const level = uniqueName('CR');
    const mk = async (dueOn: string) =>
      bodyOf(await addAction({ ownerId: owner.user.id, dueOn, factor: 'cookRun', level }), correctiveActionSchema);
    const late = await mk(daysFrom(-3));
    const soon = await mk(daysFrom(2));
    const later = await mk(daysFrom(30));
    const done = await mk(daysFrom(-5));
    await sendAs(sup, 'patch', `/api/corrective-actions/${done.id}`, {
      doneOn: today,
      verification: 'Gauge compared with a test gauge',
    }).expect(200);
    const ids = async (q: string) => (await list(owner, `mine=true&${q}`)).items.map((a) => a.id);
    expect(await ids('sort=dueOn')).toEqual([done.id, late.id, soon.id, later.id]);
    expect(await ids('state=open')).toEqual([late.id, soon.id, later.id]);
    expect(await ids('state=overdue')).toEqual([late.id]);
    expect(await ids('state=due-soon')).toEqual([soon.id]);
    expect(await ids('state=done')).toEqual([done.id]);
    expect(await ids(`factor=cookRun&level=${level}&state=open`)).toEqual([late.id, soon.id, later.id]);
    const page = await list(owner, `mine=true&pageSize=2&page=2`);
    expect(page.total).toBe(4);
    expect(page.items.map((a) => a.id)).toEqual([soon.id, later.id]);
    const byIncident = await list(tech, `incidentId=${incidentId}&pageSize=200`);
    expect(byIncident.items.every((a) => a.incident.id === incidentId)).toBe(true);
    expect(byIncident.items[0]!.incident).toMatchObject({ id: incidentId, contaminant: 'trichoderma' });
    expect((await list(await signedIn(app, 'trainer'), 'mine=true')).total).toBe(0);
  });
});
