import type { EntityManager } from 'typeorm';
import type { ActionFilters, ActionListQuery } from '../../shared/schemas/corrective-actions';
import { addDays } from '../core/calendar';
import { pageSorted, whereContains, type SortSpec } from '../core/paging';
import { dataSource } from '../db/data-source';
import { CorrectiveAction } from './corrective-action.entity';
import { Incident } from './incident.entity';

const sort: SortSpec = {
  sortable: {
    dueOn: 'a.dueOn',
    createdAt: 'a.createdAt',
    doneOn: 'a.doneOn',
    ownerName: 'a.ownerName',
    incidentId: 'a.incidentId',
  },
  defaultSort: 'dueOn',
  tieBreak: 'a.id',
};

/** Days ahead that count as "due soon": today and the six days after it. */
export const DUE_SOON_DAYS = 7;

function filtered(f: ActionFilters, userId: number, today: string) {
  const qb = dataSource.manager.createQueryBuilder(CorrectiveAction, 'a');
  if (f.state === 'open') qb.andWhere('a.doneOn IS NULL');
  if (f.state === 'done') qb.andWhere('a.doneOn IS NOT NULL');
  if (f.state === 'overdue') qb.andWhere('a.doneOn IS NULL AND a.dueOn < :today', { today });
  if (f.state === 'due-soon') {
    qb.andWhere('a.doneOn IS NULL AND a.dueOn >= :today AND a.dueOn < :soon', {
      today,
      soon: addDays(today, DUE_SOON_DAYS),
    });
  }
  if (f.mine === 'true') qb.andWhere('a.ownerId = :userId', { userId });
  if (f.incidentId !== undefined) qb.andWhere('a.incidentId = :incidentId', { incidentId: f.incidentId });
  if (f.factor) qb.andWhere('a.factor = :factor', { factor: f.factor });
  if (f.level) qb.andWhere('a.level = :level', { level: f.level });
  whereContains(qb, ['a.what', 'a.ownerName', 'a.verification'], f.q);
  return qb;
}

export const correctiveActionsRepository = {
  list: (q: ActionListQuery, userId: number, today: string) => pageSorted(filtered(q, userId, today), q, sort),

  incidentsOf: (ids: number[]) =>
    ids.length
      ? dataSource.manager
          .createQueryBuilder(Incident, 'i')
          .select(['i.id', 'i.contaminant', 'i.status', 'i.foundOn', 'i.voided'])
          .where('i.id IN (:...ids)', { ids })
          .getMany()
      : Promise.resolve([]),

  /** Locked until the transaction ends, so two edits of one action apply one after the other. */
  findForUpdate: (m: EntityManager, id: number) =>
    m.createQueryBuilder(CorrectiveAction, 'a').setLock('pessimistic_write').where('a.id = :id', { id }).getOne(),
  insert: (m: EntityManager, fields: Partial<CorrectiveAction>) => m.save(m.create(CorrectiveAction, fields)),
  save: (m: EntityManager, action: CorrectiveAction) => m.save(action),
};
