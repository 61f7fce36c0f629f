import supertest from 'supertest';
import { describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { moveNamesToStaff } from '../../server/db/migrations/1796229059780-StaffAndPasswordReset';
import { InoculationSession } from '../../server/sessions/inoculation-session.entity';
import { StaffMember } from '../../server/staff/staff-member.entity';
import { historyColumns } from '../../shared/schemas/imports';
import { createTestApp } from '../setup/test-app';
import { postCsvAs, sendAs, signedIn, uniqueName, type Client } from '../setup/factories';
import { bodyOf, issuePath } from '../setup/bodies';
import { pageOf } from '../../shared/schemas/common';
import { staffMemberSchema } from '../../shared/schemas/staff';
import { operatorsSchema, retrainRequestSchema, trainingRecordSchema } from '../../shared/schemas/training';

const app = createTestApp();
const person = () => `Staffer ${uniqueName('p')}`;

async function addStaff(client: Client, name = person(), email?: string) {
  const res = await sendAs(client, 'post', '/api/staff', { name, email });
  expect(res.status).toBe(201);
  return bodyOf(res, staffMemberSchema);
}

async function procedureVersion(trainer: Client) {
  const res = await sendAs(trainer, 'post', '/api/procedures', {
    code: uniqueName('T'),
    title: 'Sterile technique',
    steps: [{ text: 'Flame the needle until it glows; let it cool.' }],
  });
  expect(res.status).toBe(201);
  return res.body as { id: number; currentVersionId: number };
}

describe('/api/staff', () => {
  it('answers 401 without a session', async () => {
    expect((await supertest(app).get('/api/staff')).status).toBe(401);
  });

  it('answers 403 to a technician adding or editing a staff person, and lets them read the list', async () => {
    const tech = await signedIn(app, 'technician');
    expect((await tech.agent.get('/api/staff')).status).toBe(200);
    expect((await sendAs(tech, 'post', '/api/staff', { name: person() })).status).toBe(403);
    expect((await sendAs(tech, 'patch', '/api/staff/1', { active: false })).status).toBe(403);
  });

  it('answers 400 naming the field for an empty name or a bad e-mail', async () => {
    const trainer = await signedIn(app, 'trainer');
    const noName = await sendAs(trainer, 'post', '/api/staff', { name: '  ' });
    expect(noName.status).toBe(400);
    expect(issuePath(noName)).toBe('name');
    const badMail = await sendAs(trainer, 'post', '/api/staff', { name: person(), email: 'nope' });
    expect(issuePath(badMail)).toBe('email');
  });

  it('answers 404 for a staff person that does not exist', async () => {
    const admin = await signedIn(app, 'admin');
    expect((await sendAs(admin, 'patch', '/api/staff/999999', { active: false })).status).toBe(404);
  });

  it('adds, finds, edits and deactivates a staff person with audit events, refusing a name in another case', async () => {
    const supervisor = await signedIn(app, 'supervisor');
    const name = person();
    const added = await addStaff(supervisor, name, 'someone@example.invalid');
    expect(added).toMatchObject({ name, email: 'someone@example.invalid', active: true });
    const twin = await sendAs(supervisor, 'post', '/api/staff', { name: name.toUpperCase() });
    expect(twin.status).toBe(409);
    expect(issuePath(twin)).toBe('name');
    const found = await supervisor.agent.get(`/api/staff?q=${encodeURIComponent(name)}&pageSize=5`);
    expect(found.body).toMatchObject({ total: 1, page: 1, pageSize: 5, items: [{ id: added.id }] });
    const edited = await sendAs(supervisor, 'patch', `/api/staff/${added.id}`, { email: '', active: false });
    expect(edited.body).toMatchObject({ email: null, active: false });
    const inactive = await supervisor.agent.get(`/api/staff?q=${encodeURIComponent(name)}&active=true`);
    expect(bodyOf(inactive, pageOf(staffMemberSchema)).total).toBe(0);
    const events = await dataSource.manager.findBy(AuditEvent, {
      recordType: 'staff-member',
      recordId: String(added.id),
    });
    expect(events.map((e) => e.field ?? e.action).sort()).toEqual(['active', 'create', 'email']);
  });
});

describe('staff people in training', () => {
  it('trains a staff person without an account, lists the record and answers their retraining request', async () => {
    const trainer = await signedIn(app, 'trainer');
    const staff = await addStaff(trainer);
    const p = await procedureVersion(trainer);
    const asked = await sendAs(trainer, 'post', '/api/training/retrain-requests', {
      staffId: staff.id,
      procedureVersionId: p.currentVersionId,
      reason: 'Flaming was skipped on two jars.',
    });
    expect(asked.status).toBe(201);
    expect(asked.body).toMatchObject({ userId: null, staffId: staff.id, userName: staff.name, mailed: false });
    const trained = await sendAs(trainer, 'post', '/api/training-records', {
      staffId: staff.id,
      procedureVersionId: p.currentVersionId,
      trainedOn: '2026-11-20',
    });
    expect(trained.status).toBe(201);
    expect(trained.body).toMatchObject({ userId: null, staffId: staff.id, personName: staff.name });
    const listed = await trainer.agent.get(`/api/training-records?staffId=${staff.id}`);
    expect(bodyOf(listed, pageOf(trainingRecordSchema)).items).toHaveLength(1);
    const open = await trainer.agent.get(`/api/training/retrain-requests?staffId=${staff.id}&open=true`);
    expect(bodyOf(open, pageOf(retrainRequestSchema)).total).toBe(0);
    const view = await trainer.agent.get(`/api/training/operators?procedureId=${p.id}`);
    const row = bodyOf(view, operatorsSchema).operators.find((o) => o.staffId === staff.id);
    expect(row).toMatchObject({ userId: null, role: null, displayName: staff.name, trainedOnCurrent: true });
  });

  it('answers 400 naming userId when both or neither person id is given, and 422 for a deactivated staff person', async () => {
    const trainer = await signedIn(app, 'trainer');
    const staff = await addStaff(trainer);
    const p = await procedureVersion(trainer);
    const body = { procedureVersionId: p.currentVersionId, trainedOn: '2026-11-20' };
    const neither = await sendAs(trainer, 'post', '/api/training-records', body);
    expect(neither.status).toBe(400);
    expect(issuePath(neither)).toBe('userId');
    const both = await sendAs(trainer, 'post', '/api/training-records', { ...body, staffId: staff.id, userId: 1 });
    expect(both.status).toBe(400);
    await sendAs(trainer, 'patch', `/api/staff/${staff.id}`, { active: false });
    const gone = await sendAs(trainer, 'post', '/api/training-records', { ...body, staffId: staff.id });
    expect(gone.status).toBe(422);
    expect(issuePath(gone)).toBe('staffId');
    expect((await sendAs(trainer, 'post', '/api/training-records', { ...body, staffId: 999999 })).status).toBe(404);
  });
});

describe('staff people from the history import', () => {
  it('links an unknown operator to the staff list, matching a stored name without regard to case', async () => {
    const supervisor = await signedIn(app, 'supervisor');
    const known = await addStaff(supervisor);
    const fresh = person();
    const tag = uniqueName('ST');
    const line = (n: number, session: string, operator: string) => {
      const row: Record<string, string> = {
        jar_label: `${tag}-J${n}`,
        grain: 'rye',
        cook_run: `${tag}-CR`,
        cook_minutes: '90',
        inoculated_on: '2026-03-02',
        session: `${tag}-${session}`,
        operator,
        culture: `${tag}-LC`,
        outcome: 'clean',
      };
      return historyColumns.map((c) => row[c] ?? '').join(',');
    };
    const csv = [historyColumns.join(','), line(1, 'A', known.name.toLowerCase()), line(2, 'B', fresh)].join('\n');
    const res = await postCsvAs(supervisor, '/api/imports/history', csv);
    expect(res.status).toBe(200);
    const a = await dataSource.manager.findOneByOrFail(InoculationSession, { code: `${tag}-A` });
    expect(a).toMatchObject({ staffId: known.id, operatorName: known.name });
    const made = await dataSource.manager.findOneByOrFail(StaffMember, { name: fresh });
    const b = await dataSource.manager.findOneByOrFail(InoculationSession, { code: `${tag}-B` });
    expect(b).toMatchObject({ staffId: made.id, operatorName: fresh, operatorId: null });
    expect(made.active).toBe(true);
  });
});

describe('migration of operator names into the staff list', () => {
  it('keeps every name on its session and links it to one staff person per name, in any case', async () => {
    const name = person();
    const codes = [uniqueName('MS'), uniqueName('MS')];
    await dataSource.manager.insert(InoculationSession, [
      { code: codes[0], heldOn: '2026-02-02', operatorName: name, operatorId: null },
      { code: codes[1], heldOn: '2026-02-03', operatorName: ` ${name.toLowerCase()}`, operatorId: null },
    ]);
    const runner = dataSource.createQueryRunner();
    try {
      await moveNamesToStaff(runner);
    } finally {
      await runner.release();
    }
    const people = await dataSource.manager.findBy(StaffMember, { name });
    expect(people).toHaveLength(1);
    const sessions = await Promise.all(
      codes.map((code) => dataSource.manager.findOneByOrFail(InoculationSession, { code })),
    );
    expect(sessions.map((s) => s.staffId)).toEqual([people[0]?.id, people[0]?.id]);
    expect(sessions.map((s) => s.operatorName)).toEqual([name, ` ${name.toLowerCase()}`]);
  });
});
