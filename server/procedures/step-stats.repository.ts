import { whereDateRange } from '../core/paging';
import { dataSource } from '../db/data-source';
import { Incident } from '../incidents/incident.entity';
import { Jar } from '../jars/jar.entity';
import { SessionStepCheck } from '../sessions/session-step-check.entity';
import { IncidentStepLink } from './incident-step-link.entity';
import {
  jarOutcomeCounts,
  selectJarOutcomeCounts,
  type JarOutcomeCounts,
  type JarOutcomeRaw,
} from '../incidents/jar-outcome-counts';

export type GroupCounts = JarOutcomeCounts;

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
    const byTick = dataSource.manager
      .createQueryBuilder(SessionStepCheck, 'c')
      .innerJoin(Jar, 'j', 'j.sessionId = c.sessionId')
      .select('c.done', 'done');
    const qb = selectJarOutcomeCounts(byTick, incubatingAfter)
      .where('c.stepId = :stepId', { stepId })
      .groupBy('c.done');
    whereDateRange(qb, 'j.inoculatedOn', { from, to });
    const rows = await qb.getRawMany<JarOutcomeRaw & { done: number | string }>();
    const empty: GroupCounts = { jars: 0, contaminated: 0, incubating: 0 };
    const out = { ticked: empty, notTicked: empty };
    for (const r of rows) out[Number(r.done) === 1 ? 'ticked' : 'notTicked'] = jarOutcomeCounts(r);
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
