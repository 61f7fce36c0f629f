import type { GrainDto, GrainLotDto, PrepBatchDto } from '../../shared/schemas/grain';
import type { GrainLot } from './grain-lot.entity';
import type { Grain } from './grain.entity';
import type { PrepBatch } from './prep-batch.entity';

export const toGrainDto = (g: Grain): GrainDto => ({ id: g.id, name: g.name, active: g.active });

export const toGrainLotDto = (l: GrainLot, grain: Grain | undefined, prepBatchCount: number): GrainLotDto => ({
  id: l.id,
  grainId: l.grainId,
  grain: grain?.name ?? '',
  supplierLotCode: l.supplierLotCode,
  receivedOn: l.receivedOn,
  notes: l.notes,
  prepBatchCount,
  createdAt: l.createdAt.toISOString(),
});

export const toPrepBatchDto = (b: PrepBatch, lot: GrainLot | undefined, grain: Grain | undefined): PrepBatchDto => ({
  id: b.id,
  code: b.code,
  grainLotId: b.grainLotId,
  supplierLotCode: lot?.supplierLotCode ?? '',
  grainId: lot?.grainId ?? 0,
  grain: grain?.name ?? '',
  preparedOn: b.preparedOn,
  soakHours: b.soakHours,
  simmerMinutes: b.simmerMinutes,
  drainMinutes: b.drainMinutes,
  notes: b.notes,
  createdAt: b.createdAt.toISOString(),
});
