import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { Grain } from '../grain/grain.entity';
import { Jar } from '../jars/jar.entity';
import { DigestRun } from './digest-run.entity';
import { liveIncidentJarsSubquery } from '../incidents/live-incidents';

export interface WeekGrainCount {
  week: string;
  grain: string;
  jars: number;
  contaminated: number;
  incubating: number;
}

const contaminatedJars = `(${liveIncidentJarsSubquery()})`;

const weekLabel = (yw: number) => `${Math.floor(yw / 100)}-W${String(yw % 100).padStart(2, '0')}`;

export const digestRepository = {
  /** Jars per ISO week (mode 3 of YEARWEEK is ISO-8601) and grain, counted in the database. */
  async weeklyCounts(from: string, to: string, incubatingAfter: string): Promise<WeekGrainCount[]> {
    const rows = await dataSource.manager
      .createQueryBuilder(Jar, 'j')
      .innerJoin(Grain, 'g', 'g.id = j.grainId')
      .leftJoin(contaminatedJars, 'cj', 'cj.jarId = j.id')
      .select([
        'YEARWEEK(j.inoculatedOn, 3) AS yw',
        'g.name AS grain',
        'COUNT(*) AS jars',
        'SUM(CASE WHEN cj.jarId IS NOT NULL THEN 1 ELSE 0 END) AS contaminated',
        'SUM(CASE WHEN cj.jarId IS NULL AND j.inoculatedOn > :incubatingAfter THEN 1 ELSE 0 END) AS incubating',
      ])
      .where('j.inoculatedOn BETWEEN :from AND :to', { from, to, incubatingAfter })
      .groupBy('yw')
      .addGroupBy('g.name')
      .orderBy('yw', 'ASC')
      .addOrderBy('g.name', 'ASC')
      .getRawMany<{ yw: string | number; grain: string; jars: string; contaminated: string; incubating: string }>();
    return rows.map((r) => ({
      week: weekLabel(Number(r.yw)),
      grain: r.grain,
      jars: Number(r.jars),
      contaminated: Number(r.contaminated),
      incubating: Number(r.incubating),
    }));
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
