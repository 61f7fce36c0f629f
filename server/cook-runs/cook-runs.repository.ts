import type { EntityManager, SelectQueryBuilder } from 'typeorm';
import type { PageQuery } from '../../shared/schemas/common';
import type { CookRunFilters, CookRunListQuery } from '../../shared/schemas/cook-runs';
import type { TemperatureSample } from '../../shared/stats/lethality';
import { applySortAndPage } from '../core/paging';
import { dataSource } from '../db/data-source';
import { User } from '../users/user.entity';
import { CookRunReading } from './cook-run-reading.entity';
import { CookRun } from './cook-run.entity';

const sortable = {
  code: 'cr.code',
  cookedOn: 'cr.cookedOn',
  minutesAtPressure: 'cr.minutesAtPressure',
  f0: 'cr.f0',
  container: 'cr.container',
};

const exportChunk = 1000;

function filtered(f: CookRunFilters, lethalityTarget: number): SelectQueryBuilder<CookRun> {
  const qb = dataSource.manager.createQueryBuilder(CookRun, 'cr');
  if (f.q) {
    qb.andWhere('(cr.code LIKE :q OR cr.vessel LIKE :q OR cr.operatorName LIKE :q OR cr.notes LIKE :q)', {
      q: `%${f.q}%`,
    });
  }
  if (f.container) qb.andWhere('cr.container = :container', { container: f.container });
  if (f.from) qb.andWhere('cr.cookedOn >= :from', { from: f.from });
  if (f.to) qb.andWhere('cr.cookedOn <= :to', { to: f.to });
  if (f.lowLethality === 'true') qb.andWhere('cr.f0 < :target', { target: lethalityTarget });
  if (f.lowLethality === 'false') qb.andWhere('cr.f0 >= :target', { target: lethalityTarget });
  return qb;
}

export const cookRunsRepository = {
  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(CookRun, { id }),
  findByCode: (code: string, m: EntityManager = dataSource.manager) => m.findOneBy(CookRun, { code }),
  findActiveUser: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(User, { id, active: true }),

  list: (q: CookRunListQuery, lethalityTarget: number): Promise<[CookRun[], number]> =>
    applySortAndPage(filtered(q, lethalityTarget), q, sortable, '-cookedOn', 'cr.id').getManyAndCount(),

  /** Every matching row, sorted as the list is, for the CSV export; read a page at a time. */
  async all(q: CookRunFilters & Pick<PageQuery, 'sort'>, lethalityTarget: number): Promise<CookRun[]> {
    const rows: CookRun[] = [];
    for (let page = 1; ; page += 1) {
      const chunk = await applySortAndPage(
        filtered(q, lethalityTarget),
        { page, pageSize: exportChunk, sort: q.sort },
        sortable,
        '-cookedOn',
        'cr.id',
      ).getMany();
      rows.push(...chunk);
      if (chunk.length < exportChunk) return rows;
    }
  },

  readingsCount: (cookRunId: number) => dataSource.manager.countBy(CookRunReading, { cookRunId }),
  readings: (cookRunId: number) =>
    dataSource.manager.find(CookRunReading, { where: { cookRunId }, order: { minute: 'ASC' } }),

  async replaceReadings(m: EntityManager, cookRunId: number, samples: TemperatureSample[]): Promise<void> {
    await m.delete(CookRunReading, { cookRunId });
    for (let i = 0; i < samples.length; i += 1000) {
      const chunk = samples.slice(i, i + 1000).map((s) => ({ cookRunId, minute: s.minute, celsius: s.celsius }));
      await m.insert(CookRunReading, chunk);
    }
  },
};
