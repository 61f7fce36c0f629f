import type { EntityManager } from 'typeorm';
import type { Page } from '../../shared/schemas/common';
import type {
  CreateSessionInput,
  SessionDetailDto,
  SessionDto,
  SessionListQuery,
  UpdateSessionInput,
} from '../../shared/schemas/sessions';
import { patchWithAudit, recordAudit, type Actor, type AuditEntry } from '../audit/audit.service';
import { suggestCode } from '../core/code-suggestion';
import { badRequest, conflict, notFound } from '../core/errors';
import { pageResult } from '../core/paging';
import { dataSource } from '../db/data-source';
import { noOperator, resolveOperator } from '../users/users.service';
import { InoculationSession } from './inoculation-session.entity';
import { sessionsRepository } from './sessions.repository';
import { toChecklist, toSessionDto } from './sessions.mapper';

type Check = { stepId: number; done: boolean };

export async function listSessions(q: SessionListQuery): Promise<Page<SessionDto>> {
  const [rows, total] = await sessionsRepository.list(q);
  return pageResult(rows.map(toSessionDto), total, q);
}

export async function exportSessions(q: SessionListQuery): Promise<SessionDto[]> {
  return (await sessionsRepository.all(q)).map(toSessionDto);
}

export async function getSession(id: number): Promise<SessionDetailDto> {
  const session = await sessionsRepository.findById(id);
  if (!session) throw notFound('Inoculation session');
  const versionId = session.procedureVersionId;
  const [version, steps, checks] = versionId
    ? await Promise.all([
        sessionsRepository.findVersion(versionId),
        sessionsRepository.steps(versionId),
        sessionsRepository.checks(id),
      ])
    : [null, [], []];
  return {
    ...toSessionDto(session),
    procedure: version
      ? { versionId: version.id, procedureId: version.procedureId, title: version.title, version: version.version }
      : null,
    checklist: toChecklist(steps, checks),
  };
}

/** A lab with no sessions yet starts here; after that the lab's own latest code sets the pattern. */
export const firstSessionCode = 'IS-0001';

export const suggestSessionCode = () => suggestCode(InoculationSession, firstSessionCode);

async function assertCodeFree(m: EntityManager, code: string, exceptId?: number) {
  const clash = await sessionsRepository.findByCode(code, m);
  if (clash && clash.id !== exceptId) {
    throw conflict(`Session ${code} already exists.`, [
      { path: 'code', message: 'is already used by another session' },
    ]);
  }
}

/** Step ids of the version, after checking that it exists. */
async function versionStepIds(m: EntityManager, versionId: number): Promise<Set<number>> {
  if (!(await sessionsRepository.findVersion(versionId, m))) {
    throw badRequest('procedureVersionId: no such procedure version', [
      { path: 'procedureVersionId', message: 'is not a published procedure version' },
    ]);
  }
  return new Set((await sessionsRepository.steps(versionId, m)).map((s) => s.id));
}

function assertStepsBelong(checklist: Check[], stepIds: Set<number>) {
  const i = checklist.findIndex((c) => !stepIds.has(c.stepId));
  if (i >= 0) {
    throw badRequest(`checklist.${i}.stepId: not a step of the procedure version`, [
      { path: `checklist.${i}.stepId`, message: 'is not a step of the chosen procedure version' },
    ]);
  }
}

const sortedChecks = (checks: Check[]) =>
  [...checks].sort((a, b) => a.stepId - b.stepId).map((c) => ({ stepId: c.stepId, done: c.done }));

/** Inside the caller's transaction, so the history import creates sessions the same way. */
export async function insertSession(
  m: EntityManager,
  actor: Actor,
  input: CreateSessionInput,
): Promise<InoculationSession> {
  await assertCodeFree(m, input.code);
  const checklist = input.checklist ?? [];
  if (input.procedureVersionId) assertStepsBelong(checklist, await versionStepIds(m, input.procedureVersionId));
  const session = await m.save(
    m.create(InoculationSession, {
      code: input.code,
      heldOn: input.heldOn,
      startedAt: input.startedAt ? new Date(input.startedAt) : null,
      ...((await resolveOperator(m, input)) ?? noOperator),
      workspace: input.workspace,
      procedureVersionId: input.procedureVersionId ?? null,
      notes: input.notes || null,
    }),
  );
  await sessionsRepository.replaceChecks(m, session.id, checklist);
  await recordAudit(m, actor, [
    {
      action: 'create',
      recordType: 'session',
      recordId: session.id,
      newValue: { code: session.code, heldOn: session.heldOn, operator: session.operatorName },
    },
  ]);
  return session;
}

export async function createSession(actor: Actor, input: CreateSessionInput): Promise<SessionDetailDto> {
  const session = await dataSource.transaction((m) => insertSession(m, actor, input));
  return getSession(session.id);
}

export async function updateSession(actor: Actor, id: number, input: UpdateSessionInput): Promise<SessionDetailDto> {
  await dataSource.transaction(async (m) => {
    const session = await sessionsRepository.findById(id, m);
    if (!session) throw notFound('Inoculation session');
    const { reason, checklist, operatorId, operatorName, startedAt, ...rest } = input;
    if (rest.code !== undefined) await assertCodeFree(m, rest.code, id);
    if (operatorId === null && !operatorName) {
      throw badRequest('operatorId: a session needs an operator', [
        { path: 'operatorId', message: 'choose the operator or type a staff name' },
      ]);
    }
    const changes: Partial<InoculationSession> = {
      ...rest,
      // A null staff name on its own does not clear the operator: a session always has one.
      ...((await resolveOperator(m, { operatorId, operatorName: operatorName ?? undefined })) ?? {}),
    };
    if (startedAt !== undefined) changes.startedAt = startedAt ? new Date(startedAt) : null;
    if (rest.notes !== undefined) changes.notes = rest.notes || null;
    const base = { action: 'update', recordType: 'session', recordId: id, reason: reason ?? null };
    const checklistEntries: AuditEntry[] = [];

    const versionId = rest.procedureVersionId !== undefined ? rest.procedureVersionId : session.procedureVersionId;
    const before = await sessionsRepository.checks(id, m);
    let after: Check[] = checklist ?? before;
    if (versionId) {
      const stepIds = await versionStepIds(m, versionId);
      if (checklist) assertStepsBelong(checklist, stepIds);
      else after = before.filter((c) => stepIds.has(c.stepId));
    } else {
      if (checklist?.length) {
        throw badRequest('checklist: needs a procedure version', [
          { path: 'checklist', message: 'a checklist needs the procedure version it follows' },
        ]);
      }
      after = [];
    }
    const [oldList, newList] = [sortedChecks(before), sortedChecks(after)];
    if (JSON.stringify(oldList) !== JSON.stringify(newList)) {
      await sessionsRepository.replaceChecks(m, id, after);
      checklistEntries.push({ ...base, field: 'checklist', oldValue: oldList, newValue: newList });
    }
    await patchWithAudit(m, actor, session, changes, base, checklistEntries);
  });
  return getSession(id);
}
