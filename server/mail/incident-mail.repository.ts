import type { EntityManager } from 'typeorm';
import type { Contaminant, ClusterFactor } from '../../shared/enums';
import { CookRun } from '../cook-runs/cook-run.entity';
import { Culture } from '../cultures/culture.entity';
import { dataSource } from '../db/data-source';
import { IncidentJar } from '../incidents/incident-jar.entity';
import { Incident } from '../incidents/incident.entity';
import { Jar } from '../jars/jar.entity';
import { InoculationSession } from '../sessions/inoculation-session.entity';
import { ClusterAlert } from './cluster-alert.entity';
import { liveIncidentSql } from '../incidents/live-incidents';
import { dateText } from '../core/calendar';
import { numberOrNull } from '../core/raw-values';

export interface IncidentJarRow {
  label: string;
  cookRunId: number | null;
  cookRun: string | null;
  sessionId: number | null;
  session: string | null;
  cultureId: number | null;
  culture: string | null;
}

/** Whitelisted jar columns per cluster dimension; never built from input. */
export const dimensionColumn: Record<ClusterFactor, string> = {
  cookRun: 'j.cookRunId',
  culture: 'j.cultureId',
  session: 'j.sessionId',
};

export const incidentMailRepository = {
  findIncident: (id: number) => dataSource.manager.findOneBy(Incident, { id }),

  async jarsOf(incidentId: number): Promise<IncidentJarRow[]> {
    const rows = await dataSource.manager
      .createQueryBuilder(IncidentJar, 'ij')
      .innerJoin(Jar, 'j', 'j.id = ij.jarId')
      .leftJoin(CookRun, 'cr', 'cr.id = j.cookRunId')
      .leftJoin(InoculationSession, 's', 's.id = j.sessionId')
      .leftJoin(Culture, 'c', 'c.id = j.cultureId')
      .select([
        'j.label AS label',
        'j.cookRunId AS cookRunId',
        'cr.code AS cookRun',
        'j.sessionId AS sessionId',
        's.code AS session',
        'j.cultureId AS cultureId',
        'c.code AS culture',
      ])
      .where('ij.incidentId = :incidentId', { incidentId })
      .orderBy('j.label', 'ASC')
      .getRawMany<Record<string, unknown>>();
    return rows.map((r) => ({
      label: String(r.label),
      cookRunId: numberOrNull(r.cookRunId),
      cookRun: (r.cookRun as string | null) ?? null,
      sessionId: numberOrNull(r.sessionId),
      session: (r.session as string | null) ?? null,
      cultureId: numberOrNull(r.cultureId),
      culture: (r.culture as string | null) ?? null,
    }));
  },

  /** Counting incidents (not voided, not ruled out) with a jar of this level found in [from, to]. */
  async clusterIncidents(m: EntityManager, dimension: ClusterFactor, levelId: number, from: string, to: string) {
    const rows = await m
      .createQueryBuilder(Incident, 'i')
      .innerJoin(IncidentJar, 'ij', 'ij.incidentId = i.id')
      .innerJoin(Jar, 'j', 'j.id = ij.jarId')
      .select([
        'i.id AS id',
        'i.foundOn AS foundOn',
        'i.contaminant AS contaminant',
        'COUNT(DISTINCT ij.jarId) AS jars',
      ])
      .where(`${dimensionColumn[dimension]} = :levelId`, { levelId })
      .andWhere(liveIncidentSql('i'))
      .andWhere('i.foundOn BETWEEN :from AND :to', { from, to })
      .groupBy('i.id')
      .addGroupBy('i.foundOn')
      .addGroupBy('i.contaminant')
      .orderBy('i.foundOn', 'ASC')
      .addOrderBy('i.id', 'ASC')
      .getRawMany<{ id: string | number; foundOn: string | Date; contaminant: Contaminant; jars: string | number }>();
    return rows.map((r) => ({
      id: Number(r.id),
      foundOn: dateText(r.foundOn) ?? '',
      contaminant: r.contaminant,
      jars: Number(r.jars),
    }));
  },

  /** The alerted cluster this window continues, if any. */
  openAlert: (m: EntityManager, dimension: ClusterFactor, levelId: number, windowStart: string) =>
    m
      .createQueryBuilder(ClusterAlert, 'a')
      .where('a.dimension = :dimension AND a.levelId = :levelId AND a.lastFoundOn >= :windowStart', {
        dimension,
        levelId,
        windowStart,
      })
      .orderBy('a.lastFoundOn', 'DESC')
      .getOne(),
  saveAlert: (m: EntityManager, alert: ClusterAlert) => m.save(alert),
  insertAlert: (m: EntityManager, fields: Partial<ClusterAlert>) => m.save(m.create(ClusterAlert, fields)),
};
