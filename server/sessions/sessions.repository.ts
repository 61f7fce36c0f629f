import { type EntityManager, type SelectQueryBuilder } from 'typeorm';
import type { PageQuery } from '../../shared/schemas/common';
import type { SessionFilters, SessionListQuery } from '../../shared/schemas/sessions';
import { applySortAndPage } from '../core/paging';
import { dataSource } from '../db/data-source';
import { ProcedureStep } from '../procedures/procedure-step.entity';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { User } from '../users/user.entity';
import { InoculationSession } from './inoculation-session.entity';
import { SessionStepCheck } from './session-step-check.entity';

const sortable = { code: 's.code', heldOn: 's.heldOn', operator: 's.operatorName' };
const exportChunk = 1000;

function filtered(f: SessionFilters): SelectQueryBuilder<InoculationSession> {
  const qb = dataSource.manager.createQueryBuilder(InoculationSession, 's');
  if (f.from) qb.andWhere('s.heldOn >= :from', { from: f.from });
  if (f.to) qb.andWhere('s.heldOn <= :to', { to: f.to });
  if (f.operator) qb.andWhere('s.operatorName = :operator', { operator: f.operator });
  if (f.workspace) qb.andWhere('s.workspace = :workspace', { workspace: f.workspace });
  if (f.q) qb.andWhere('(s.code LIKE :q OR s.operatorName LIKE :q OR s.notes LIKE :q)', { q: `%${f.q}%` });
  return qb;
}

export const sessionsRepository = {
  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(InoculationSession, { id }),
  findByCode: (code: string, m: EntityManager = dataSource.manager) => m.findOneBy(InoculationSession, { code }),
  findActiveUser: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(User, { id, active: true }),
  findVersion: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(ProcedureVersion, { id }),
  steps: (versionId: number, m: EntityManager = dataSource.manager) =>
    m.find(ProcedureStep, { where: { versionId }, order: { position: 'ASC' } }),
  checks: (sessionId: number, m: EntityManager = dataSource.manager) => m.findBy(SessionStepCheck, { sessionId }),

  list: (q: SessionListQuery): Promise<[InoculationSession[], number]> =>
    applySortAndPage(filtered(q), q, sortable, '-heldOn', 's.id').getManyAndCount(),

  async all(q: SessionFilters & Pick<PageQuery, 'sort'>): Promise<InoculationSession[]> {
    const rows: InoculationSession[] = [];
    for (let page = 1; ; page += 1) {
      const chunk = await applySortAndPage(
        filtered(q),
        { page, pageSize: exportChunk, sort: q.sort },
        sortable,
        '-heldOn',
        's.id',
      ).getMany();
      rows.push(...chunk);
      if (chunk.length < exportChunk) return rows;
    }
  },

  async replaceChecks(m: EntityManager, sessionId: number, checks: { stepId: number; done: boolean }[]): Promise<void> {
    await m.delete(SessionStepCheck, { sessionId });
    if (checks.length)
      await m.insert(
        SessionStepCheck,
        checks.map((c) => ({ sessionId, stepId: c.stepId, done: c.done })),
      );
  },
};
