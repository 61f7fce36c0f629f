import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../server/audit/audit-event.entity';
import { dataSource } from '../../server/db/data-source';
import { ProcedureStep } from '../../server/procedures/procedure-step.entity';
import { ProcedureVersion } from '../../server/procedures/procedure-version.entity';
import { Procedure } from '../../server/procedures/procedure.entity';
import { pageOf } from '../../shared/schemas/common';
import { sessionDetailSchema, sessionSchema } from '../../shared/schemas/sessions';
import { createTestApp } from '../setup/test-app';
import { anonymousStatuses, sendAs, signedIn, uniqueName, type Client } from '../setup/factories';
import { bodyOf, errorOf, issuePath } from '../setup/bodies';

const app = createTestApp();

const newSession = (over: Record<string, unknown> = {}) => ({
  code: uniqueName('IS'),
  heldOn: '2026-03-03',
  operatorName: 'Staff Member One',
  workspace: 'flow-hood',
  notes: 'twelve 1 L jars',
  ...over,
});

/** A procedure version with its steps, written straight to the tables the procedures module owns. */
async function makeVersion(texts: string[]) {
  const m = dataSource.manager;
  const procedure = await m.save(m.create(Procedure, { code: uniqueName('SOP'), title: 'Inoculating jars' }));
  const version = await m.save(
    m.create(ProcedureVersion, { procedureId: procedure.id, version: 1, title: 'Inoculating jars' }),
  );
  const steps = await m.save(
    texts.map((text, i) => m.create(ProcedureStep, { versionId: version.id, position: i + 1, text })),
  );
  return { version, steps };
}

let tech: Client;
beforeAll(async () => {
  tech = await signedIn(app, 'technician');
});

const create = (client: Client, body: Record<string, unknown>) => sendAs(client, 'post', '/api/sessions', body);
const patch = (client: Client, id: number, body: Record<string, unknown>) =>
  sendAs(client, 'patch', `/api/sessions/${id}`, body);
/** A new session, as its create route answers. */
const created = async (client: Client, body: Record<string, unknown>) =>
  bodyOf(await create(client, body), sessionDetailSchema);
const sessionPageSchema = pageOf(sessionSchema);

describe('/api/sessions guards and validation', () => {
  it('answers 401 without a session', async () => {
    const urls = ['/api/sessions', '/api/sessions/1', '/api/sessions/export.csv'];
    expect(await anonymousStatuses(app, urls)).toEqual([401, 401, 401]);
  });

  it('lets a trainer read but answers 403 to writes', async () => {
    const trainer = await signedIn(app, 'trainer');
    const session = await created(tech, newSession());
    expect((await trainer.agent.get(`/api/sessions/${session.id}`)).status).toBe(200);
    expect((await create(trainer, newSession())).status).toBe(403);
    expect((await patch(trainer, session.id, { notes: 'x' })).status).toBe(403);
  });

  it.each([
    ['heldOn', { heldOn: undefined }],
    ['workspace', { workspace: 'kitchen' }],
    ['operatorId', { operatorName: undefined }],
    ['operatorName', { operatorId: 1 }],
    ['startedAt', { startedAt: 'morning' }],
    ['checklist', { checklist: [{ stepId: 1, done: true }] }],
  ])('answers 400 naming %s', async (field, over) => {
    const res = await create(tech, newSession(over));
    expect(res.status).toBe(400);
    expect(errorOf(res).issues!.map((i: { path: string }) => i.path)).toContain(field);
  });

  it('answers 400 naming the field for an unknown operator, procedure version or step', async () => {
    const op = await create(tech, newSession({ operatorName: undefined, operatorId: 999999 }));
    expect(issuePath(op)).toBe('operatorId');
    const version = await create(tech, newSession({ procedureVersionId: 999999 }));
    expect(issuePath(version)).toBe('procedureVersionId');
    const mine = await makeVersion(['Wipe the box with 70 % alcohol']);
    const other = await makeVersion(['Flame the needle']);
    const step = await create(
      tech,
      newSession({
        procedureVersionId: mine.version.id,
        checklist: [
          { stepId: mine.steps[0]!.id, done: true },
          { stepId: other.steps[0]!.id, done: true },
        ],
      }),
    );
    expect(step.status).toBe(400);
    expect(issuePath(step)).toBe('checklist.1.stepId');
  });

  it('answers 404 for an unknown session', async () => {
    expect((await tech.agent.get('/api/sessions/999999')).status).toBe(404);
    expect((await patch(tech, 999999, { notes: 'x' })).status).toBe(404);
  });

  it('answers 409 naming code when the code is taken', async () => {
    const body = newSession();
    expect((await create(tech, body)).status).toBe(201);
    const res = await create(tech, body);
    expect(res.status).toBe(409);
    expect(issuePath(res)).toBe('code');
  });
});

describe('/api/sessions records', () => {
  it('stores a user operator by id and display name, or a staff name alone', async () => {
    const mine = await created(tech, newSession({ operatorName: undefined, operatorId: tech.user.id }));
    expect(mine).toMatchObject({ operatorId: tech.user.id, operatorName: 'Test technician' });
    const staff = await created(tech, newSession({ operatorName: 'Former Staff' }));
    expect(staff).toMatchObject({ operatorId: null, operatorName: 'Former Staff', checklist: [], procedure: null });
    const audit = await dataSource.manager.findOneBy(AuditEvent, {
      recordType: 'session',
      recordId: String(staff.id),
      action: 'create',
    });
    expect(audit?.newValue).toContain('Former Staff');
  });

  it('shows every step of the followed version with what was ticked', async () => {
    const { version, steps } = await makeVersion([
      'Wipe the box and lids with 70 % alcohol',
      'Let the alcohol dry',
      'Flame the needle between jars',
    ]);
    const res = await create(
      tech,
      newSession({
        procedureVersionId: version.id,
        startedAt: '2026-03-03T08:15:00Z',
        checklist: [
          { stepId: steps[0]!.id, done: true },
          { stepId: steps[2]!.id, done: false },
        ],
      }),
    );
    expect(res.status).toBe(201);
    const session = bodyOf(res, sessionDetailSchema);
    expect(session.procedure).toMatchObject({ versionId: version.id, title: 'Inoculating jars', version: 1 });
    expect(session.checklist.map((r) => [r.position, r.done])).toEqual([
      [1, true],
      [2, null],
      [3, false],
    ]);
    expect(session.startedAt).toBe('2026-03-03T08:15:00.000Z');
  });

  it('audits field edits and checklist changes with old and new values', async () => {
    const { version, steps } = await makeVersion(['Wipe down', 'Flame the needle']);
    const session = await created(
      tech,
      newSession({ procedureVersionId: version.id, checklist: [{ stepId: steps[0]!.id, done: false }] }),
    );
    const res = await patch(tech, session.id, {
      workspace: 'still-air-box',
      checklist: [
        { stepId: steps[0]!.id, done: true },
        { stepId: steps[1]!.id, done: true },
      ],
      reason: 'ticked after the run',
    });
    expect(res.status).toBe(200);
    const edited = bodyOf(res, sessionDetailSchema);
    expect(edited.workspace).toBe('still-air-box');
    expect(edited.checklist.map((r) => r.done)).toEqual([true, true]);
    const events = await dataSource.manager.findBy(AuditEvent, {
      recordType: 'session',
      recordId: String(session.id),
      action: 'update',
    });
    const byField = Object.fromEntries(events.map((e) => [String(e.field), e] as const));
    expect(byField.workspace).toMatchObject({
      oldValue: 'flow-hood',
      newValue: 'still-air-box',
      reason: 'ticked after the run',
    });
    expect(JSON.parse(byField.checklist!.oldValue!)).toEqual([{ stepId: steps[0]!.id, done: false }]);
    expect(JSON.parse(byField.checklist!.newValue!)).toHaveLength(2);
    const cleared = await patch(tech, session.id, { procedureVersionId: null });
    expect(cleared.body).toMatchObject({ procedureVersionId: null, checklist: [] });
    const noOperator = await patch(tech, session.id, { operatorId: null });
    expect(noOperator.status).toBe(400);
    expect(issuePath(noOperator)).toBe('operatorId');
  });

  it('pages, sorts and filters on the server, and exports CSV', async () => {
    const tag = uniqueName('batch');
    const rows = [
      ['Cara Operator', '2026-04-01', 'flow-hood'],
      ['Abel Operator', '2026-04-02', 'still-air-box'],
      ['Bea Operator', '2026-04-03', 'flow-hood'],
    ] as const;
    for (const [operatorName, heldOn, workspace] of rows) {
      await create(tech, newSession({ code: `${tag}-${heldOn}`, operatorName, heldOn, workspace, notes: tag }));
    }
    const byOperator = bodyOf(
      await tech.agent.get(`/api/sessions?q=${tag}&sort=operator&pageSize=2`),
      sessionPageSchema,
    );
    expect(byOperator.total).toBe(3);
    expect(byOperator.items.map((s) => s.operatorName)).toEqual(['Abel Operator', 'Bea Operator']);
    const hood = bodyOf(
      await tech.agent.get(`/api/sessions?q=${tag}&workspace=flow-hood&sort=-heldOn`),
      sessionPageSchema,
    );
    expect(hood.items.map((s) => s.heldOn)).toEqual(['2026-04-03', '2026-04-01']);
    const ranged = bodyOf(
      await tech.agent.get(`/api/sessions?q=${tag}&from=2026-04-02&to=2026-04-02`),
      sessionPageSchema,
    );
    expect(ranged.items.map((s) => s.operatorName)).toEqual(['Abel Operator']);
    const one = bodyOf(await tech.agent.get(`/api/sessions?q=${tag}&operator=bea%20operator`), sessionPageSchema);
    expect(one.items.map((s) => s.heldOn)).toEqual(['2026-04-03']);
    expect((await tech.agent.get('/api/sessions?sort=room')).status).toBe(400);

    const csv = await tech.agent.get(`/api/sessions/export.csv?q=${tag}&sort=heldOn`);
    expect(csv.headers['content-type']).toMatch(/^text\/csv/);
    const lines = csv.text
      .replace(/^\uFEFF/, '')
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe('code,held_on,started_at,operator,workspace,procedure_version_id,notes');
    expect(lines.slice(1).map((l) => l.split(',')[3])).toEqual(['Cara Operator', 'Abel Operator', 'Bea Operator']);
    expect(lines[2]).toContain('still-air box');
  });
});
