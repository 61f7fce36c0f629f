import type { EntityManager } from 'typeorm';
import type { Page } from '../../shared/schemas/common';
import type {
  CreateSessionInput,
  SessionDetailDto,
  SessionDto,
  SessionListQuery,
  UpdateSessionInput,
} from '../../shared/schemas/sessions';
import { patchWithAudit, recordCreated, type Actor, type AuditEntry } from '../audit/audit.service';
import { suggestCode } from '../core/code-suggestion';
import { badRequest, conflict, notFound } from '../core/errors';
import { pageResult } from '../core/paging';
import { assertNewCodes } from '../core/new-codes';
import { dataSource } from '../db/data-source';
import { noOperator, resolveOperator, type OperatorFields } from '../users/users.service';
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

const codeTaken = (code: string) =>
  conflict(`Session ${code} already exists.`, [{ path: 'code', message: 'is already used by another session' }]);

async function assertCodeFree(m: EntityManager, code: string, exceptId?: number) {
  const clash = await sessionsRepository.findByCode(code, m);
  if (clash && clash.id !== exceptId) throw codeTaken(code);
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

/**
 * A session as the register takes it, typed on the screen or read from a history file; a history file's
 * operator without an account comes linked to the lab's staff list (staffId).
 */
export type NewSession = Pick<CreateSessionInput, 'code' | 'heldOn'> &
  Partial<Omit<CreateSessionInput, 'code' | 'heldOn'>> & { staffId?: number | null };

/**
 * Inside the caller's transaction. The screen makes one session and the history import many, by the
 * same rules: codes not yet used, an active account or a typed name for the operator, checklist steps
 * of the chosen procedure version, an audit row each. `history`: the rows come from a history file.
 */
export async function insertSessions(
  m: EntityManager,
  actor: Actor,
  inputs: NewSession[],
  { history = false } = {},
): Promise<number[]> {
  if (inputs.length === 0) return [];
  // A history file may name an operator whose account has since been closed; a new session may not.
  const operators = new Map<number, OperatorFields | null>();
  const operatorOf = async (input: NewSession) => {
    if (!input.operatorId) return resolveOperator(m, input);
    if (!operators.has(input.operatorId)) {
      operators.set(input.operatorId, await resolveOperator(m, input, { closedAccounts: history }));
    }
    return operators.get(input.operatorId)!;
  };
  await assertNewCodes(
    inputs.map((i) => i.code),
    (codes) => sessionsRepository.findByCodes(m, codes),
    codeTaken,
  );
  const rows: Partial<InoculationSession>[] = [];
  for (const input of inputs) {
    const checklist = input.checklist ?? [];
    if (input.procedureVersionId) assertStepsBelong(checklist, await versionStepIds(m, input.procedureVersionId));
    rows.push({
      code: input.code,
      heldOn: input.heldOn,
      startedAt: input.startedAt ? new Date(input.startedAt) : null,
      ...((await operatorOf(input)) ?? noOperator),
      staffId: input.staffId ?? null,
      workspace: input.workspace ?? null,
      procedureVersionId: input.procedureVersionId ?? null,
      notes: input.notes || null,
    });
  }
  const ids = await sessionsRepository.insertMany(m, rows);
  for (const [i, input] of inputs.entries()) {
    if (input.checklist?.length) await sessionsRepository.replaceChecks(m, ids[i]!, input.checklist);
  }
  await recordCreated(
    m,
    actor,
    'session',
    rows.map((r, i) => ({ id: ids[i]!, newValue: { code: r.code, heldOn: r.heldOn, operator: r.operatorName } })),
  );
  return ids;
}

/** The sessions already recorded under any of the codes (compared as the column's collation does). */
/** Inside the caller's transaction (the demo loader's): what a history file leaves out about a session. */
export const setSessionDetails = (
  m: EntityManager,
  code: string,
  details: Pick<InoculationSession, 'startedAt' | 'workspace'>,
) => sessionsRepository.updateByCode(m, code, details);

export const sessionsByCodes = (m: EntityManager, codes: string[]) => sessionsRepository.findByCodes(m, codes);

export async function createSession(actor: Actor, input: CreateSessionInput): Promise<SessionDetailDto> {
  const [id] = await dataSource.transaction((m) => insertSessions(m, actor, [input]));
  return getSession(id!);
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
    await patchWithAudit(m, actor, session, changes, sessionsRepository.save, base, checklistEntries);
  });
  return getSession(id);
}
