import { type EntityManager, type QueryDeepPartialEntity, type SelectQueryBuilder } from 'typeorm';
import type { PageQuery } from '../../shared/schemas/common';
import type { SessionFilters, SessionListQuery } from '../../shared/schemas/sessions';
import { allSorted, pageSorted, whereContains, whereDateRange, type PageTotal, type SortSpec } from '../core/paging';
import { findByValues, insertMany } from '../db/bulk';
import { dataSource } from '../db/data-source';
import { ProcedureStep } from '../procedures/procedure-step.entity';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { InoculationSession } from './inoculation-session.entity';
import { SessionStepCheck } from './session-step-check.entity';

const sort: SortSpec = {
  sortable: { code: 's.code', heldOn: 's.heldOn', operator: 's.operatorName' },
  defaultSort: '-heldOn',
  tieBreak: 's.id',
  unique: ['s.code'],
};

function filtered(f: SessionFilters): SelectQueryBuilder<InoculationSession> {
  const qb = dataSource.manager.createQueryBuilder(InoculationSession, 's');
  whereDateRange(qb, 's.heldOn', f);
  if (f.operator) qb.andWhere('s.operatorName = :operator', { operator: f.operator });
  if (f.workspace) qb.andWhere('s.workspace = :workspace', { workspace: f.workspace });
  return whereContains(qb, ['s.code', 's.operatorName', 's.notes'], f.q);
}

export const sessionsRepository = {
  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(InoculationSession, { id }),
  findByCode: (code: string, m: EntityManager = dataSource.manager) => m.findOneBy(InoculationSession, { code }),
  findByCodes: (m: EntityManager, codes: string[]) =>
    findByValues(m, InoculationSession, 'code', codes, {
      id: true,
      code: true,
      heldOn: true,
      operatorId: true,
      operatorName: true,
    }),
  insertMany: (m: EntityManager, rows: QueryDeepPartialEntity<InoculationSession>[]) =>
    insertMany(m, InoculationSession, rows),
  save: (m: EntityManager, session: InoculationSession) => m.save(session),
  updateByCode: (m: EntityManager, code: string, fields: Partial<InoculationSession>) =>
    m.update(InoculationSession, { code }, fields),
  findVersion: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(ProcedureVersion, { id }),
  steps: (versionId: number, m: EntityManager = dataSource.manager) =>
    m.find(ProcedureStep, { where: { versionId }, order: { position: 'ASC' } }),
  checks: (sessionId: number, m: EntityManager = dataSource.manager) => m.findBy(SessionStepCheck, { sessionId }),

  list: (q: SessionListQuery): Promise<[InoculationSession[], PageTotal]> => pageSorted(filtered(q), q, sort),
  all: (q: SessionFilters & Pick<PageQuery, 'sort'>) => allSorted(() => filtered(q), q.sort, sort),

  async replaceChecks(m: EntityManager, sessionId: number, checks: { stepId: number; done: boolean }[]): Promise<void> {
    await m.delete(SessionStepCheck, { sessionId });
    if (checks.length)
      await m.insert(
        SessionStepCheck,
        checks.map((c) => ({ sessionId, stepId: c.stepId, done: c.done })),
      );
  },
};
