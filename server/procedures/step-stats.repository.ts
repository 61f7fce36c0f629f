import { whereDateRange } from '../core/paging';
import { dataSource } from '../db/data-source';
import { Incident } from '../incidents/incident.entity';
import { Jar } from '../jars/jar.entity';
import { SessionStepCheck } from '../sessions/session-step-check.entity';
import { IncidentStepLink } from './incident-step-link.entity';
import { liveIncidentJarsSubquery } from '../incidents/live-incidents';

export interface GroupCounts {
  jars: number;
  contaminated: number;
  incubating: number;
}

const contaminatedJars = `(${liveIncidentJarsSubquery()})`;

export const stepStatsRepository = {
  /**
   * Jars of sessions whose checklist holds this step, split by whether it was ticked. Sessions that
   * followed another version have no row for the step and are left out of both groups.
   */
  async countsByTick(
    stepId: number,
    incubatingAfter: string,
    from?: string,
    to?: string,
  ): Promise<{ ticked: GroupCounts; notTicked: GroupCounts }> {
    const qb = dataSource.manager
      .createQueryBuilder(SessionStepCheck, 'c')
      .innerJoin(Jar, 'j', 'j.sessionId = c.sessionId')
      .leftJoin(contaminatedJars, 'cj', 'cj.jarId = j.id')
      .select([
        'c.done AS done',
        'COUNT(*) AS jars',
        'SUM(CASE WHEN cj.jarId IS NOT NULL THEN 1 ELSE 0 END) AS contaminated',
        'SUM(CASE WHEN cj.jarId IS NULL AND j.inoculatedOn > :incubatingAfter THEN 1 ELSE 0 END) AS incubating',
      ])
      .where('c.stepId = :stepId', { stepId, incubatingAfter })
      .groupBy('c.done');
    whereDateRange(qb, 'j.inoculatedOn', { from, to });
    const rows = await qb.getRawMany<{
      done: number | string;
      jars: string;
      contaminated: string;
      incubating: string;
    }>();
    const empty = (): GroupCounts => ({ jars: 0, contaminated: 0, incubating: 0 });
    const out = { ticked: empty(), notTicked: empty() };
    for (const r of rows) {
      const group = Number(r.done) === 1 ? out.ticked : out.notTicked;
      group.jars = Number(r.jars);
      group.contaminated = Number(r.contaminated);
      group.incubating = Number(r.incubating);
    }
    return out;
  },

  async incidentsLinked(stepId: number): Promise<number> {
    const row = await dataSource.manager
      .createQueryBuilder(IncidentStepLink, 'l')
      .innerJoin(Incident, 'i', 'i.id = l.incidentId AND i.voided = 0')
      .select('COUNT(DISTINCT l.incidentId)', 'n')
      .where('l.stepId = :stepId', { stepId })
      .getRawOne<{ n: string }>();
    return Number(row?.n ?? 0);
  },
};
