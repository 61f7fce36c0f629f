import type { EntityManager } from 'typeorm';
import type { Page } from '../../shared/schemas/common';
import type {
  CreateGrainInput,
  CreateGrainLotInput,
  CreatePrepBatchInput,
  GrainDto,
  GrainLotDetailDto,
  GrainLotDto,
  GrainLotListQuery,
  PrepBatchDto,
  PrepBatchListQuery,
} from '../../shared/schemas/grain';
import { recordCreated, type Actor } from '../audit/audit.service';
import { badRequest, conflict, notFound } from '../core/errors';
import { pageResult } from '../core/paging';
import { dataSource } from '../db/data-source';
import { GrainLot } from './grain-lot.entity';
import { toGrainDto, toGrainLotDto, toPrepBatchDto } from './grain.mapper';
import { grainRepository } from './grain.repository';
import { PrepBatch } from './prep-batch.entity';

const byId = <T extends { id: number }>(rows: T[]) => new Map(rows.map((r) => [r.id, r]));

export async function listGrains(m?: EntityManager): Promise<GrainDto[]> {
  return (await grainRepository.listGrains(m)).map(toGrainDto);
}

export async function createGrain(actor: Actor, input: CreateGrainInput): Promise<GrainDto> {
  return dataSource.transaction(async (m) => {
    // The column's collation compares case-insensitively, so "Rye" clashes with "rye".
    if (await grainRepository.findGrainByName(input.name, m)) {
      throw conflict('That grain is already on the list.', [{ path: 'name', message: 'is already on the grain list' }]);
    }
    const grain = await grainRepository.insertGrain(m, { name: input.name, active: true });
    await recordCreated(m, actor, 'grain', [{ id: grain.id, newValue: { name: grain.name } }]);
    return toGrainDto(grain);
  });
}

async function lotDtos(lots: GrainLot[], m?: EntityManager): Promise<GrainLotDto[]> {
  const [grains, counts] = await Promise.all([
    grainRepository.grainsByIds([...new Set(lots.map((l) => l.grainId))], m),
    grainRepository.batchCounts(
      lots.map((l) => l.id),
      m,
    ),
  ]);
  const grainById = byId(grains);
  return lots.map((l) => toGrainLotDto(l, grainById.get(l.grainId), counts.get(l.id) ?? 0));
}

async function batchDtos(batches: PrepBatch[], m?: EntityManager): Promise<PrepBatchDto[]> {
  const lots = byId(await grainRepository.lotsByIds([...new Set(batches.map((b) => b.grainLotId))], m));
  const grains = byId(await grainRepository.grainsByIds([...new Set([...lots.values()].map((l) => l.grainId))], m));
  return batches.map((b) => {
    const lot = lots.get(b.grainLotId);
    return toPrepBatchDto(b, lot, lot ? grains.get(lot.grainId) : undefined);
  });
}

export async function listGrainLots(q: GrainLotListQuery): Promise<Page<GrainLotDto>> {
  const [lots, total] = await grainRepository.listLots(q);
  return pageResult(await lotDtos(lots), total, q);
}

export async function getGrainLot(id: number): Promise<GrainLotDetailDto> {
  const lot = await grainRepository.findLotById(id);
  if (!lot) throw notFound('Grain lot');
  const [dto] = await lotDtos([lot]);
  const [batches] = await grainRepository.listBatches({ grainLotId: id, page: 1, pageSize: 200 }, null);
  return { ...dto!, prepBatches: await batchDtos(batches) };
}

/** A grain's lot by its supplier's code, or null. */
export const findGrainLot = (m: EntityManager, grainId: number, supplierLotCode: string) =>
  grainRepository.findLot(grainId, supplierLotCode, m);
export const prepBatchesByCodes = (m: EntityManager, codes: string[]) => grainRepository.batchesByCodes(m, codes);

/** Inside the caller's transaction: the screen's one lot, or the demo loader's many. */
export async function insertGrainLot(m: EntityManager, actor: Actor, input: CreateGrainLotInput): Promise<GrainLot> {
  const grain = await grainRepository.findGrainById(input.grainId, m);
  if (!grain) throw badRequest('grainId: no such grain', [{ path: 'grainId', message: 'is not on the grain list' }]);
  if (await grainRepository.findLot(input.grainId, input.supplierLotCode, m)) {
    throw conflict(`Lot ${input.supplierLotCode} of ${grain.name} is already recorded.`, [
      { path: 'supplierLotCode', message: `is already recorded for ${grain.name}` },
    ]);
  }
  const saved = await grainRepository.insertLot(m, {
    grainId: input.grainId,
    supplierLotCode: input.supplierLotCode,
    receivedOn: input.receivedOn,
    notes: input.notes || null,
  });
  await recordCreated(m, actor, 'grain-lot', [
    { id: saved.id, newValue: { grain: grain.name, supplierLotCode: saved.supplierLotCode } },
  ]);
  return saved;
}

export async function createGrainLot(actor: Actor, input: CreateGrainLotInput): Promise<GrainLotDto> {
  const lot = await dataSource.transaction((m) => insertGrainLot(m, actor, input));
  const [dto] = await lotDtos([lot]);
  return dto!;
}

/** `grain` may be an id or a name from the lab's list. */
async function resolveGrainFilter(grain: string | undefined): Promise<number | null> {
  if (!grain) return null;
  const found = /^\d+$/.test(grain)
    ? await grainRepository.findGrainById(Number(grain))
    : await grainRepository.findGrainByName(grain);
  if (!found)
    throw badRequest(`grain: "${grain}" is not on the grain list`, [
      { path: 'grain', message: 'is not on the grain list' },
    ]);
  return found.id;
}

export async function listPrepBatches(q: PrepBatchListQuery): Promise<Page<PrepBatchDto>> {
  const [batches, total] = await grainRepository.listBatches(q, await resolveGrainFilter(q.grain));
  return pageResult(await batchDtos(batches), total, q);
}

export async function getPrepBatch(id: number, manager?: EntityManager): Promise<PrepBatchDto> {
  const batch = await grainRepository.findBatchById(id, manager);
  if (!batch) throw notFound('Prep batch');
  const [dto] = await batchDtos([batch], manager);
  return dto!;
}

/** Inside the caller's transaction: the screen's one batch, or the demo loader's many. */
export async function insertPrepBatch(m: EntityManager, actor: Actor, input: CreatePrepBatchInput): Promise<PrepBatch> {
  if (!(await grainRepository.findLotById(input.grainLotId, m))) {
    throw badRequest('grainLotId: no such grain lot', [{ path: 'grainLotId', message: 'is not a recorded grain lot' }]);
  }
  if (await grainRepository.findBatchByCode(input.code, m)) {
    throw conflict(`Prep batch ${input.code} already exists.`, [
      { path: 'code', message: 'is already used by another prep batch' },
    ]);
  }
  const saved = await grainRepository.insertBatch(m, {
    code: input.code,
    grainLotId: input.grainLotId,
    preparedOn: input.preparedOn,
    soakHours: input.soakHours ?? null,
    simmerMinutes: input.simmerMinutes ?? null,
    drainMinutes: input.drainMinutes ?? null,
    notes: input.notes || null,
  });
  await recordCreated(m, actor, 'prep-batch', [
    { id: saved.id, newValue: { code: saved.code, grainLotId: saved.grainLotId } },
  ]);
  return saved;
}

export async function createPrepBatch(actor: Actor, input: CreatePrepBatchInput): Promise<PrepBatchDto> {
  const batch = await dataSource.transaction((m) => insertPrepBatch(m, actor, input));
  return getPrepBatch(batch.id);
}
