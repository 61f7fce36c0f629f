import { In, type EntityManager } from 'typeorm';
import {
  grainLotSortFields,
  prepBatchSortFields,
  type GrainLotListQuery,
  type PrepBatchListQuery,
} from '../../shared/schemas/grain';
import { pageSorted, type PageTotal } from '../core/paging';
import { dataSource } from '../db/data-source';
import { GrainLot } from './grain-lot.entity';
import { Grain } from './grain.entity';
import { PrepBatch } from './prep-batch.entity';

const lotSortable: Record<(typeof grainLotSortFields)[number], string> = {
  receivedOn: 'l.receivedOn',
  supplierLotCode: 'l.supplierLotCode',
  createdAt: 'l.createdAt',
};
const batchSortable: Record<(typeof prepBatchSortFields)[number], string> = {
  code: 'pb.code',
  preparedOn: 'pb.preparedOn',
  createdAt: 'pb.createdAt',
};

export const grainRepository = {
  insertGrain: (m: EntityManager, fields: Partial<Grain>) => m.save(m.create(Grain, fields)),
  insertLot: (m: EntityManager, fields: Partial<GrainLot>) => m.save(m.create(GrainLot, fields)),
  insertBatch: (m: EntityManager, fields: Partial<PrepBatch>) => m.save(m.create(PrepBatch, fields)),

  listGrains: (m: EntityManager = dataSource.manager) => m.find(Grain, { order: { name: 'ASC' } }),
  findGrainById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(Grain, { id }),
  findGrainByName: (name: string, m: EntityManager = dataSource.manager) => m.findOneBy(Grain, { name }),
  grainsByIds: async (ids: number[], m: EntityManager = dataSource.manager) =>
    ids.length ? m.findBy(Grain, { id: In(ids) }) : [],

  findLotById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(GrainLot, { id }),
  findLot: (grainId: number, supplierLotCode: string, m: EntityManager = dataSource.manager) =>
    m.findOneBy(GrainLot, { grainId, supplierLotCode }),
  lotsByIds: async (ids: number[], m: EntityManager = dataSource.manager) =>
    ids.length ? m.findBy(GrainLot, { id: In(ids) }) : [],

  async listLots(q: GrainLotListQuery): Promise<[GrainLot[], PageTotal]> {
    const qb = dataSource.manager.createQueryBuilder(GrainLot, 'l');
    if (q.grainId) qb.andWhere('l.grainId = :grainId', { grainId: q.grainId });
    if (q.q) qb.andWhere('l.supplierLotCode LIKE :q', { q: `%${q.q}%` });
    return pageSorted(qb, q, { sortable: lotSortable, defaultSort: '-receivedOn', tieBreak: 'l.id' });
  },

  async batchCounts(lotIds: number[], m: EntityManager = dataSource.manager): Promise<Map<number, number>> {
    if (lotIds.length === 0) return new Map();
    const rows = await m
      .createQueryBuilder(PrepBatch, 'pb')
      .select('pb.grainLotId', 'lotId')
      .addSelect('COUNT(*)', 'n')
      .where('pb.grainLotId IN (:...lotIds)', { lotIds })
      .groupBy('pb.grainLotId')
      .getRawMany<{ lotId: number; n: string }>();
    return new Map(rows.map((r) => [Number(r.lotId), Number(r.n)]));
  },

  findBatchById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(PrepBatch, { id }),
  findBatchByCode: (code: string, m: EntityManager = dataSource.manager) => m.findOneBy(PrepBatch, { code }),
  batchesByCodes: async (m: EntityManager, codes: string[]) =>
    codes.length ? m.findBy(PrepBatch, { code: In(codes) }) : [],

  async listBatches(q: PrepBatchListQuery, grainId: number | null): Promise<[PrepBatch[], PageTotal]> {
    const qb = dataSource.manager.createQueryBuilder(PrepBatch, 'pb');
    if (q.grainLotId) qb.andWhere('pb.grainLotId = :lotId', { lotId: q.grainLotId });
    if (grainId !== null) {
      qb.innerJoin(GrainLot, 'l', 'l.id = pb.grainLotId').andWhere('l.grainId = :grainId', { grainId });
    }
    if (q.q) qb.andWhere('pb.code LIKE :q', { q: `%${q.q}%` });
    return pageSorted(qb, q, {
      sortable: batchSortable,
      defaultSort: '-preparedOn',
      tieBreak: 'pb.id',
      unique: ['pb.code'],
    });
  },
};
