import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { Grain } from '../grain/grain.entity';
import { Jar } from '../jars/jar.entity';
import { DigestRun } from './digest-run.entity';
import {
  jarOutcomeCounts,
  selectJarOutcomeCounts,
  type JarOutcomeCounts,
  type JarOutcomeRaw,
} from '../incidents/jar-outcome-counts';

export interface WeekGrainCount extends JarOutcomeCounts {
  week: string;
  grain: string;
}

const weekLabel = (yw: number) => `${Math.floor(yw / 100)}-W${String(yw % 100).padStart(2, '0')}`;

export const digestRepository = {
  /** Jars per ISO week (mode 3 of YEARWEEK is ISO-8601) and grain, counted in the database. */
  async weeklyCounts(from: string, to: string, incubatingAfter: string): Promise<WeekGrainCount[]> {
    const byWeekAndGrain = dataSource.manager
      .createQueryBuilder(Jar, 'j')
      .innerJoin(Grain, 'g', 'g.id = j.grainId')
      .select(['YEARWEEK(j.inoculatedOn, 3) AS yw', 'g.name AS grain']);
    const rows = await selectJarOutcomeCounts(byWeekAndGrain, incubatingAfter)
      .where('j.inoculatedOn BETWEEN :from AND :to', { from, to })
      .groupBy('yw')
      .addGroupBy('g.name')
      .orderBy('yw', 'ASC')
      .addOrderBy('g.name', 'ASC')
      .getRawMany<JarOutcomeRaw & { yw: string | number; grain: string }>();
    return rows.map((r) => ({ week: weekLabel(Number(r.yw)), grain: r.grain, ...jarOutcomeCounts(r) }));
  },

  findRun: (isoWeek: string) => dataSource.manager.findOneBy(DigestRun, { isoWeek }),

  /** INSERT IGNORE: answers false when another instance already holds this week. */
  async claimWeek(m: EntityManager, isoWeek: string, trigger: DigestRun['trigger']): Promise<boolean> {
    const result: unknown = await m.query('INSERT IGNORE INTO digest_runs (isoWeek, `trigger`) VALUES (?, ?)', [
      isoWeek,
      trigger,
    ]);
    const packet = (Array.isArray(result) ? result[0] : result) as { affectedRows?: number } | undefined;
    return packet?.affectedRows === 1;
  },

  finishRun: (m: EntityManager, isoWeek: string, sent: number, failed: number) =>
    m.update(DigestRun, { isoWeek }, { sent, failed, finishedAt: new Date() }),
};
