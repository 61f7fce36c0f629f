import { dateOnly } from '../core/raw-values';
import { dataSource } from '../db/data-source';
import { liveIncidentJarPairsSql } from '../incidents/live-incidents';

export interface OperatorCounts {
  sessions: number;
  jars: number;
  contaminatedJars: number;
  incidents: number;
}

export interface OperatorTraining {
  trainedVersion: number;
  lastTrainedOn: string;
  trainedOnCurrent: boolean;
}

type Raw = Record<string, unknown>;

const personKey = (a: string) =>
  `CASE WHEN ${a}.userId IS NOT NULL THEN CONCAT('u', ${a}.userId) ELSE CONCAT('s', ${a}.staffId) END`;

const liveIncidentJars = `(${liveIncidentJarPairsSql})`;

export const operatorsRepository = {
  /**
   * Active technicians and supervisors, active staff people, and anyone else who has run a session.
   * `key` is `u<id>` for a user and `s<id>` for a staff person, so both kinds share one map.
   */
  async people(): Promise<
    { key: string; userId: number | null; staffId: number | null; displayName: string; role: string | null }[]
  > {
    const rows = await dataSource.query<Raw[]>(
      `SELECT u.id AS userId, NULL AS staffId, u.displayName AS displayName, u.role AS role FROM users u
       WHERE (u.active = 1 AND u.role IN ('technician', 'supervisor'))
          OR EXISTS (SELECT 1 FROM inoculation_sessions s WHERE s.operatorId = u.id)
       UNION ALL
       SELECT NULL, m.id, m.name, NULL FROM staff_members m
       WHERE m.active = 1 OR EXISTS (SELECT 1 FROM inoculation_sessions s WHERE s.staffId = m.id)
       ORDER BY displayName, userId, staffId`,
    );
    return rows.map((r) => ({
      key: r.userId === null ? `s${Number(r.staffId)}` : `u${Number(r.userId)}`,
      userId: r.userId === null ? null : Number(r.userId),
      staffId: r.staffId === null ? null : Number(r.staffId),
      displayName: String(r.displayName),
      role: typeof r.role === 'string' ? r.role : null,
    }));
  },

  /** Sessions, jars and live incidents per operator, grouped in the database. */
  async counts(): Promise<Map<string, OperatorCounts>> {
    const rows = await dataSource.query<Raw[]>(
      `SELECT CASE WHEN s.operatorId IS NOT NULL THEN CONCAT('u', s.operatorId) ELSE CONCAT('s', s.staffId) END AS k,
              COUNT(DISTINCT s.id) AS sessions, COUNT(DISTINCT j.id) AS jars,
              COUNT(DISTINCT lij.jarId) AS contaminatedJars, COUNT(DISTINCT lij.incidentId) AS incidents
       FROM inoculation_sessions s
       LEFT JOIN jars j ON j.sessionId = s.id
       LEFT JOIN ${liveIncidentJars} lij ON lij.jarId = j.id
       WHERE s.operatorId IS NOT NULL OR s.staffId IS NOT NULL
       GROUP BY k`,
    );
    return new Map(
      rows.map((r) => [
        String(r.k),
        {
          sessions: Number(r.sessions),
          jars: Number(r.jars),
          contaminatedJars: Number(r.contaminatedJars),
          incidents: Number(r.incidents),
        },
      ]),
    );
  },

  async training(procedureId: number, currentVersionId: number | null): Promise<Map<string, OperatorTraining>> {
    const rows = await dataSource.query<Raw[]>(
      `SELECT ${personKey('t')} AS k, MAX(v.version) AS trainedVersion, MAX(t.trainedOn) AS lastTrainedOn,
              MAX(CASE WHEN t.procedureVersionId = ? THEN 1 ELSE 0 END) AS onCurrent
       FROM training_records t JOIN procedure_versions v ON v.id = t.procedureVersionId
       WHERE v.procedureId = ? AND (t.userId IS NOT NULL OR t.staffId IS NOT NULL)
       GROUP BY k`,
      [currentVersionId ?? 0, procedureId],
    );
    return new Map(
      rows.map((r) => [
        String(r.k),
        {
          trainedVersion: Number(r.trainedVersion),
          lastTrainedOn: dateOnly(r.lastTrainedOn as Date | string),
          trainedOnCurrent: Number(r.onCurrent) === 1,
        },
      ]),
    );
  },

  async openRequests(procedureId: number): Promise<Map<string, number>> {
    const rows = await dataSource.query<Raw[]>(
      `SELECT ${personKey('r')} AS k, COUNT(*) AS n FROM retraining_requests r
       JOIN procedure_versions v ON v.id = r.procedureVersionId
       WHERE v.procedureId = ? AND r.doneAt IS NULL GROUP BY k`,
      [procedureId],
    );
    return new Map(rows.map((r) => [String(r.k), Number(r.n)]));
  },

  firstProcedureId: async (): Promise<number | undefined> => {
    const rows = await dataSource.query<Raw[]>('SELECT MIN(id) AS id FROM procedures');
    return rows[0]?.id === null || rows[0]?.id === undefined ? undefined : Number(rows[0].id);
  },
};
