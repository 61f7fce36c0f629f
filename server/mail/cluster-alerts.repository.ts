import { IsNull, type EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { ClusterAlert } from './cluster-alert.entity';

export const clusterAlertsRepository = {
  unseen: (limit: number) =>
    dataSource.manager.findAndCount(ClusterAlert, {
      where: { seenAt: IsNull() },
      order: { alertedAt: 'DESC', id: 'DESC' },
      take: limit,
    }),
  /** Locked until the transaction ends, so two people marking it seen write one row of audit. */
  lockById: (m: EntityManager, id: number) =>
    m.findOne(ClusterAlert, { where: { id }, lock: { mode: 'pessimistic_write' } }),
  markSeen: (m: EntityManager, id: number, seenAt: Date, seenByName: string) =>
    m.update(ClusterAlert, { id }, { seenAt, seenByName }),
};
