import type { EntityManager, SelectQueryBuilder } from 'typeorm';
import type { PageQuery } from '../../shared/schemas/common';
import type { CookRunFilters, CookRunListQuery } from '../../shared/schemas/cook-runs';
import type { TemperatureSample } from '../../shared/stats/lethality';
import { allSorted, pageSorted, whereContains, whereDateRange, type SortSpec } from '../core/paging';
import { dataSource } from '../db/data-source';
import { CookRunReading } from './cook-run-reading.entity';
import { CookRun } from './cook-run.entity';

const sort: SortSpec = {
  sortable: {
    code: 'cr.code',
    cookedOn: 'cr.cookedOn',
    minutesAtPressure: 'cr.minutesAtPressure',
    f0: 'cr.f0',
    container: 'cr.container',
  },
  defaultSort: '-cookedOn',
  tieBreak: 'cr.id',
};

function filtered(f: CookRunFilters, lethalityTarget: number): SelectQueryBuilder<CookRun> {
  const qb = dataSource.manager.createQueryBuilder(CookRun, 'cr');
  whereContains(qb, ['cr.code', 'cr.vessel', 'cr.operatorName', 'cr.notes'], f.q);
  if (f.container) qb.andWhere('cr.container = :container', { container: f.container });
  whereDateRange(qb, 'cr.cookedOn', f);
  if (f.lowLethality === 'true') qb.andWhere('cr.f0 < :target', { target: lethalityTarget });
  if (f.lowLethality === 'false') qb.andWhere('cr.f0 >= :target', { target: lethalityTarget });
  return qb;
}

export const cookRunsRepository = {
  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(CookRun, { id }),
  findByCode: (code: string, m: EntityManager = dataSource.manager) => m.findOneBy(CookRun, { code }),

  list: (q: CookRunListQuery, lethalityTarget: number): Promise<[CookRun[], number]> =>
    pageSorted(filtered(q, lethalityTarget), q, sort),
  all: (q: CookRunFilters & Pick<PageQuery, 'sort'>, lethalityTarget: number) =>
    allSorted(() => filtered(q, lethalityTarget), q.sort, sort),

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
