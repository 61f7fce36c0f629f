import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { IdempotentRequest } from './idempotent-request.entity';

export const idempotencyRepository = {
  find: (userId: number, key: string, m: EntityManager = dataSource.manager) =>
    m.findOneBy(IdempotentRequest, { userId, key }),

  findForUpdate: (m: EntityManager, userId: number, key: string) =>
    m.findOne(IdempotentRequest, { where: { userId, key }, lock: { mode: 'pessimistic_write' } }),

  insert: (m: EntityManager, row: Pick<IdempotentRequest, 'userId' | 'key' | 'scope' | 'recordId'>) =>
    m.insert(IdempotentRequest, row),

  setRecord: (m: EntityManager, userId: number, key: string, recordId: number) =>
    m.update(IdempotentRequest, { userId, key }, { recordId }),

  saveAnswer: (userId: number, key: string, status: number, body: string) =>
    dataSource.manager.update(IdempotentRequest, { userId, key }, { status, body }),

  markUndone: (m: EntityManager, id: number) => m.update(IdempotentRequest, { id }, { undoneAt: new Date() }),
};
