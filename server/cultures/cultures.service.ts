import type { EntityManager } from 'typeorm';
import type { Page } from '../../shared/schemas/common';
import {
  cultureTransitions,
  type AgarTestDto,
  type ChangeCultureStateInput,
  type CreateAgarTestInput,
  type CreateCultureInput,
  type CultureDetailDto,
  type CultureDto,
  type CultureListQuery,
  type UpdateCultureInput,
} from '../../shared/schemas/cultures';
import { patchWithAudit, recordAudit, recordCreated, type Actor } from '../audit/audit.service';
import { badRequest, conflict, notFound } from '../core/errors';
import { pageResult } from '../core/paging';
import { assertNewCodes } from '../core/new-codes';
import { dataSource } from '../db/data-source';
import { Culture } from './culture.entity';
import { culturesRepository } from './cultures.repository';
import { toAgarTestDto, toCultureDto, toCultureSummaryDto } from './cultures.mapper';

/** A stored culture, as other modules read it. */
export type CultureRecord = Culture;

async function withParentCodes(rows: Culture[]): Promise<CultureDto[]> {
  const parentIds = [...new Set(rows.map((c) => c.parentCultureId).filter((id): id is number => id !== null))];
  const parents = new Map((await culturesRepository.byIds(parentIds)).map((p) => [p.id, p.code]));
  return rows.map((c) => toCultureDto(c, c.parentCultureId ? (parents.get(c.parentCultureId) ?? null) : null));
}

export async function listCultures(q: CultureListQuery): Promise<Page<CultureDto>> {
  const [rows, total] = await culturesRepository.list(q);
  return pageResult(await withParentCodes(rows), total, q);
}

export async function exportCultures(q: CultureListQuery): Promise<CultureDto[]> {
  return withParentCodes(await culturesRepository.all(q));
}

export async function getCulture(id: number): Promise<CultureDetailDto> {
  const culture = await culturesRepository.findById(id);
  if (!culture) throw notFound('Culture');
  const [parent, children, tests] = await Promise.all([
    culture.parentCultureId ? culturesRepository.findById(culture.parentCultureId) : null,
    culturesRepository.children(id),
    culturesRepository.agarTests(id),
  ]);
  return {
    ...toCultureDto(culture, parent?.code ?? null),
    parent: parent ? toCultureSummaryDto(parent) : null,
    children: children.map(toCultureSummaryDto),
    agarTests: tests.map(toAgarTestDto),
    allowedStates: [...cultureTransitions[culture.state]],
  };
}

/**
 * For whoever makes jars from a culture: a warning to show (and keep) when the culture is not
 * released, or null when it is.
 */
export async function cultureUseWarning(cultureId: number, m?: EntityManager): Promise<string | null> {
  const culture = await culturesRepository.findById(cultureId, m);
  if (!culture) throw notFound('Culture');
  return culture.state === 'released' ? null : `Culture ${culture.code} is ${culture.state}, not released.`;
}

const codeTaken = (code: string) =>
  conflict(`Culture ${code} already exists.`, [{ path: 'code', message: 'is already used by another culture' }]);

async function assertCodeFree(m: EntityManager, code: string, exceptId?: number) {
  const clash = await culturesRepository.findByCode(code, m);
  if (clash && clash.id !== exceptId) throw codeTaken(code);
}

async function findParent(m: EntityManager, parentId: number): Promise<Culture> {
  const parent = await culturesRepository.findById(parentId, m);
  if (!parent)
    throw badRequest('parentCultureId: no such culture', [
      { path: 'parentCultureId', message: 'is not a recorded culture' },
    ]);
  return parent;
}

/** A culture as the register takes it, typed on the screen or named in a history file (code only). */
export type NewCulture = Pick<CreateCultureInput, 'code'> & Partial<Omit<CreateCultureInput, 'code'>>;

/**
 * Inside the caller's transaction. The screen makes one culture and the history import many, by the
 * same rules: codes not yet used, a recorded parent and the generation after it, an audit row each.
 * A new culture waits in quarantine until tested; one named in a history file had already been used to
 * inoculate jars, so the import records it as released.
 */
export async function insertCultures(
  m: EntityManager,
  actor: Actor,
  inputs: NewCulture[],
  state: 'quarantined' | 'released' = 'quarantined',
): Promise<number[]> {
  if (inputs.length === 0) return [];
  await assertNewCodes(
    inputs.map((i) => i.code),
    (codes) => culturesRepository.findByCodes(m, codes),
    codeTaken,
  );
  const rows: Partial<Culture>[] = [];
  for (const input of inputs) {
    const parent = input.parentCultureId ? await findParent(m, input.parentCultureId) : null;
    rows.push({
      code: input.code,
      species: input.species || null,
      strain: input.strain || null,
      preparedOn: input.preparedOn ?? null,
      generation: input.generation ?? (parent && parent.generation !== null ? parent.generation + 1 : null),
      volumeMl: input.volumeMl ?? null,
      parentCultureId: parent?.id ?? null,
      state,
      notes: input.notes || null,
    });
  }
  const ids = await culturesRepository.insertMany(m, rows);
  await recordCreated(
    m,
    actor,
    'culture',
    rows.map((r, i) => ({ id: ids[i]!, newValue: { code: r.code, state: r.state } })),
  );
  return ids;
}

/** The cultures already recorded under any of the codes (compared as the column's collation does). */
/** Inside the caller's transaction (the demo loader's): what a history file leaves out about a culture. */
export const setCultureDetails = (
  m: EntityManager,
  code: string,
  details: Pick<Culture, 'species' | 'strain' | 'generation' | 'volumeMl' | 'parentCultureId' | 'preparedOn' | 'state'>,
) => culturesRepository.updateByCode(m, code, details);

export const culturesByCodes = (m: EntityManager, codes: string[]) => culturesRepository.findByCodes(m, codes);

export async function createCulture(actor: Actor, input: CreateCultureInput): Promise<CultureDetailDto> {
  const [id] = await dataSource.transaction((m) => insertCultures(m, actor, [input]));
  return getCulture(id!);
}

export async function updateCulture(actor: Actor, id: number, input: UpdateCultureInput): Promise<CultureDetailDto> {
  await dataSource.transaction(async (m) => {
    const culture = await culturesRepository.findById(id, m);
    if (!culture) throw notFound('Culture');
    const { reason, ...changes } = input;
    if (changes.code !== undefined) await assertCodeFree(m, changes.code, id);
    if (changes.parentCultureId) {
      await findParent(m, changes.parentCultureId);
      const ancestors = await culturesRepository.ancestorIds(changes.parentCultureId, m);
      if (changes.parentCultureId === id || ancestors.includes(id)) {
        throw badRequest('parentCultureId: a culture cannot descend from itself', [
          { path: 'parentCultureId', message: 'would make the culture its own ancestor' },
        ]);
      }
    }
    const normalised: Partial<Culture> = { ...changes };
    for (const key of ['species', 'strain', 'notes'] as const) {
      if (changes[key] !== undefined) normalised[key] = changes[key] || null;
    }
    await patchWithAudit(m, actor, culture, normalised, culturesRepository.save, {
      action: 'update',
      recordType: 'culture',
      recordId: id,
      reason: reason ?? null,
    });
  });
  return getCulture(id);
}

export async function changeCultureState(
  actor: Actor,
  id: number,
  input: ChangeCultureStateInput,
): Promise<CultureDetailDto> {
  await dataSource.transaction(async (m) => {
    const culture = await culturesRepository.findById(id, m);
    if (!culture) throw notFound('Culture');
    const allowed = cultureTransitions[culture.state];
    if (!allowed.includes(input.state)) {
      const next = allowed.length ? `it can go to ${allowed.join(' or ')}` : 'a retired culture stays retired';
      throw conflict(`Culture ${culture.code} is ${culture.state}; ${next}.`, [
        { path: 'state', message: `cannot change from ${culture.state} to ${input.state}` },
      ]);
    }
    await recordAudit(m, actor, [
      {
        action: 'state',
        recordType: 'culture',
        recordId: id,
        field: 'state',
        oldValue: culture.state,
        newValue: input.state,
        reason: input.reason,
      },
    ]);
    await culturesRepository.setState(m, id, input.state);
  });
  return getCulture(id);
}

export async function addAgarTest(actor: Actor, cultureId: number, input: CreateAgarTestInput): Promise<AgarTestDto> {
  return dataSource.transaction(async (m) => {
    if (!(await culturesRepository.findById(cultureId, m))) throw notFound('Culture');
    if (input.photoId && !(await culturesRepository.photoExists(input.photoId, m))) {
      throw badRequest('photoId: no such photo', [{ path: 'photoId', message: 'is not an uploaded photo' }]);
    }
    const test = await culturesRepository.insertAgarTest(m, {
      cultureId,
      testedOn: input.testedOn,
      result: input.result,
      notes: input.notes || null,
      photoId: input.photoId ?? null,
      recordedById: actor.id,
    });
    await recordAudit(m, actor, [
      {
        action: 'agar-test',
        recordType: 'culture',
        recordId: cultureId,
        field: 'agarTest',
        newValue: { id: test.id, testedOn: test.testedOn, result: test.result },
      },
    ]);
    return toAgarTestDto(test);
  });
}
