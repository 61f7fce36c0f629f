import type { EntityManager, QueryDeepPartialEntity, SelectQueryBuilder } from 'typeorm';
import type { PageQuery } from '../../shared/schemas/common';
import type { CookRunFilters, CookRunListQuery } from '../../shared/schemas/cook-runs';
import type { CookRule } from '../../shared/stats/cook-verdict';
import type { TemperatureSample } from '../../shared/stats/lethality';
import { allSorted, pageSorted, whereContains, whereDateRange, type PageTotal, type SortSpec } from '../core/paging';
import { findByValues, insertMany } from '../db/bulk';
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
  unique: ['cr.code'],
};

/**
 * The SQL twin of judgeCook (shared/stats/cook-verdict.ts): a centre-probe log against the F0 target,
 * anything else by minutes against the container's minimum; a container with no minimum is not judged.
 */
function belowTargetSql(rule: CookRule): { sql: string; params: Record<string, unknown> } {
  const params: Record<string, unknown> = { target: rule.lethalityTarget };
  const whens = Object.entries(rule.containerMinutes).map(([name, minutes], i) => {
    params[`cn${i}`] = name.trim().toLowerCase();
    params[`cm${i}`] = minutes;
    return `WHEN LOWER(TRIM(cr.container)) = :cn${i} THEN :cm${i}`;
  });
  const minimum = whens.length ? `(CASE ${whens.join(' ')} ELSE NULL END)` : 'NULL';
  const centre = "cr.f0Source = 'log' AND cr.logPlacement = 'centre' AND cr.f0 IS NOT NULL";
  return {
    sql: `COALESCE(CASE WHEN ${centre} THEN cr.f0 < :target ELSE cr.minutesAtPressure < ${minimum} END, 0) = 1`,
    params,
  };
}

function filtered(f: CookRunFilters, rule: CookRule): SelectQueryBuilder<CookRun> {
  const qb = dataSource.manager.createQueryBuilder(CookRun, 'cr');
  whereContains(qb, ['cr.code', 'cr.vessel', 'cr.operatorName', 'cr.notes'], f.q);
  if (f.container) qb.andWhere('cr.container = :container', { container: f.container });
  whereDateRange(qb, 'cr.cookedOn', f);
  const below = f.belowTarget ?? f.lowLethality;
  if (below) {
    const { sql, params } = belowTargetSql(rule);
    qb.andWhere(below === 'true' ? sql : `NOT (${sql})`, params);
  }
  return qb;
}

export const cookRunsRepository = {
  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(CookRun, { id }),
  findByCode: (code: string, m: EntityManager = dataSource.manager) => m.findOneBy(CookRun, { code }),
  findByCodes: (m: EntityManager, codes: string[]) =>
    findByValues(m, CookRun, 'code', codes, { id: true, code: true, minutesAtPressure: true }),
  insertMany: (m: EntityManager, rows: QueryDeepPartialEntity<CookRun>[]) => insertMany(m, CookRun, rows),
  save: (m: EntityManager, run: CookRun) => m.save(run),
  updateByCode: (m: EntityManager, code: string, fields: Partial<CookRun>) => m.update(CookRun, { code }, fields),

  list: (q: CookRunListQuery, rule: CookRule): Promise<[CookRun[], PageTotal]> =>
    pageSorted(filtered(q, rule), q, sort),
  all: (q: CookRunFilters & Pick<PageQuery, 'sort'>, rule: CookRule) =>
    allSorted(() => filtered(q, rule), q.sort, sort),

  /** The F0 a run carries and where it came from, set beside its temperature log. */
  setF0: (m: EntityManager, id: number, fields: Pick<CookRun, 'f0' | 'f0Source' | 'logPlacement'>) =>
    m.update(CookRun, { id }, fields),

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
