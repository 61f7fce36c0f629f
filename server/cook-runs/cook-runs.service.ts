import type { EntityManager } from 'typeorm';
import type { Page } from '../../shared/schemas/common';
import type {
  CookRunDetailDto,
  CookRunDto,
  CookRunListQuery,
  CreateCookRunValues,
  UpdateCookRunInput,
} from '../../shared/schemas/cook-runs';
import type { CookRule } from '../../shared/stats/cook-verdict';
import { patchWithAudit, recordCreated, type Actor } from '../audit/audit.service';
import { suggestCode } from '../core/code-suggestion';
import { badRequest, conflict, notFound } from '../core/errors';
import { localDate } from '../core/local-time';
import { pageResult } from '../core/paging';
import { assertNewCodes } from '../core/new-codes';
import { dataSource } from '../db/data-source';
import { getLabSettings } from '../settings/settings.service';
import { noOperator, resolveOperator, type OperatorFields } from '../users/users.service';
import { estimatedF0 } from './cook-run-lethality';
import { CookRun } from './cook-run.entity';
import { cookRunsRepository } from './cook-runs.repository';
import { toCookRunDto } from './cook-runs.mapper';

const target = async (): Promise<CookRule> => {
  const s = await getLabSettings();
  return { lethalityTarget: s.lethalityTarget, containerMinutes: s.containerMinutes };
};

export async function listCookRuns(q: CookRunListQuery): Promise<Page<CookRunDto>> {
  const t = await target();
  const [rows, total] = await cookRunsRepository.list(q, t);
  return pageResult(
    rows.map((r) => toCookRunDto(r, t)),
    total,
    q,
  );
}

export async function exportCookRuns(q: CookRunListQuery): Promise<CookRunDto[]> {
  const t = await target();
  return (await cookRunsRepository.all(q, t)).map((r) => toCookRunDto(r, t));
}

export async function getCookRun(id: number): Promise<CookRunDetailDto> {
  const run = await cookRunsRepository.findById(id);
  if (!run) throw notFound('Cook run');
  const [t, readingsCount] = await Promise.all([target(), cookRunsRepository.readingsCount(id)]);
  return { ...toCookRunDto(run, t), readingsCount };
}

/** A lab with no cook runs yet starts here; after that the lab's own latest code sets the pattern. */
export const firstCookRunCode = 'CR-0001';

export const suggestCookRunCode = () => suggestCode(CookRun, firstCookRunCode);

const codeTaken = (code: string) =>
  conflict(`Cook run ${code} already exists.`, [{ path: 'code', message: 'is already used by another cook run' }]);

async function assertCodeFree(m: EntityManager, code: string, exceptId?: number) {
  const clash = await cookRunsRepository.findByCode(code, m);
  if (clash && clash.id !== exceptId) throw codeTaken(code);
}

/** A run as the register takes it, typed on the screen or read from a history file (code and minutes only). */
export type NewCookRun = Pick<CreateCookRunValues, 'code' | 'minutesAtPressure'> &
  Partial<Omit<CreateCookRunValues, 'code' | 'minutesAtPressure'>>;

function cookRunRow(input: NewCookRun, operator: OperatorFields | null): Partial<CookRun> {
  const startedAt = input.startedAt ? new Date(input.startedAt) : null;
  const cycle = {
    minutesAtPressure: input.minutesAtPressure,
    gaugeKPa: input.gaugeKPa ?? null,
    altitudeM: input.altitudeM ?? 0,
  };
  return {
    code: input.code,
    vessel: input.vessel || null,
    startedAt,
    cookedOn: input.cookedOn ?? (startedAt ? localDate(startedAt) : null),
    ...cycle,
    ventingMinutes: input.ventingMinutes ?? null,
    container: input.container ?? null,
    loadCount: input.loadCount ?? null,
    ...(operator ?? noOperator),
    f0: estimatedF0(cycle),
    f0Source: 'estimate',
    notes: input.notes || null,
  };
}

/**
 * Inside the caller's transaction. The screen makes one run and the history import many, by the same
 * rules: codes not yet used, the F0 estimate from the cycle, an audit row for each run.
 */
export async function insertCookRuns(m: EntityManager, actor: Actor, inputs: NewCookRun[]): Promise<number[]> {
  if (inputs.length === 0) return [];
  await assertNewCodes(
    inputs.map((i) => i.code),
    (codes) => cookRunsRepository.findByCodes(m, codes),
    codeTaken,
  );
  const rows: Partial<CookRun>[] = [];
  for (const input of inputs) rows.push(cookRunRow(input, await resolveOperator(m, input)));
  const ids = await cookRunsRepository.insertMany(m, rows);
  await recordCreated(
    m,
    actor,
    'cook-run',
    rows.map((r, i) => ({ id: ids[i]!, newValue: { code: r.code, minutesAtPressure: r.minutesAtPressure } })),
  );
  return ids;
}

/** What a history file leaves out about a run (the cycle, the vessel, the operator). */
export type CookRunDetails = Pick<
  CookRun,
  | 'vessel'
  | 'cookedOn'
  | 'startedAt'
  | 'minutesAtPressure'
  | 'gaugeKPa'
  | 'ventingMinutes'
  | 'altitudeM'
  | 'container'
  | 'loadCount'
  | 'operatorId'
  | 'operatorName'
>;

/** Inside the caller's transaction (the demo loader's): the details and the F0 estimate of their cycle. */
export const setCookRunDetails = (m: EntityManager, code: string, details: CookRunDetails) =>
  cookRunsRepository.updateByCode(m, code, { ...details, f0: estimatedF0(details), f0Source: 'estimate' });

/** The cook runs already recorded under any of the codes (compared as the column's collation does). */
export const cookRunsByCodes = (m: EntityManager, codes: string[]) => cookRunsRepository.findByCodes(m, codes);

export async function createCookRun(actor: Actor, input: CreateCookRunValues): Promise<CookRunDetailDto> {
  const [id] = await dataSource.transaction((m) => insertCookRuns(m, actor, [input]));
  return getCookRun(id!);
}

export async function updateCookRun(actor: Actor, id: number, input: UpdateCookRunInput): Promise<CookRunDetailDto> {
  await dataSource.transaction(async (m) => {
    const run = await cookRunsRepository.findById(id, m);
    if (!run) throw notFound('Cook run');
    const { reason, startedAt, operatorId, operatorName, ...rest } = input;
    if (rest.code !== undefined) await assertCodeFree(m, rest.code, id);
    const changes: Partial<CookRun> = { ...rest, ...((await resolveOperator(m, { operatorId, operatorName })) ?? {}) };
    if (rest.vessel !== undefined) changes.vessel = rest.vessel || null;
    if (rest.notes !== undefined) changes.notes = rest.notes || null;
    if (startedAt !== undefined) {
      changes.startedAt = startedAt ? new Date(startedAt) : null;
      if (startedAt && rest.cookedOn === undefined) changes.cookedOn = localDate(new Date(startedAt));
    }
    if (changes.cookedOn === null && (changes.startedAt ?? run.startedAt) === null) {
      throw badRequest('cookedOn: a run needs a date', [
        { path: 'cookedOn', message: 'enter the date of the run or its start time' },
      ]);
    }
    // A logged F0 stands on its own; the estimate follows the cycle it was computed from.
    const cycleChanged = ['minutesAtPressure', 'gaugeKPa', 'altitudeM'].some((k) => k in rest);
    if (run.f0Source !== 'log' && cycleChanged) {
      changes.f0 = estimatedF0({ ...run, ...changes });
      changes.f0Source = 'estimate';
    }
    await patchWithAudit(m, actor, run, changes, cookRunsRepository.save, {
      action: 'update',
      recordType: 'cook-run',
      recordId: id,
      reason: reason ?? null,
    });
  });
  return getCookRun(id);
}
