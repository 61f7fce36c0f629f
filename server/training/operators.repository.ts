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
const day = (v: unknown) => (v instanceof Date ? v.toISOString().slice(0, 10) : String(v).slice(0, 10));

const liveIncidentJars = `(${liveIncidentJarPairsSql})`;

export const operatorsRepository = {
  /** Active technicians and supervisors, and anyone else who has run a session. */
  async people(): Promise<{ userId: number; displayName: string; role: string }[]> {
    const rows = await dataSource.query<Raw[]>(
      `SELECT u.id AS userId, u.displayName AS displayName, u.role AS role FROM users u
       WHERE (u.active = 1 AND u.role IN ('technician', 'supervisor'))
          OR EXISTS (SELECT 1 FROM inoculation_sessions s WHERE s.operatorId = u.id)
       ORDER BY u.displayName, u.id`,
    );
    return rows.map((r) => ({ userId: Number(r.userId), displayName: String(r.displayName), role: String(r.role) }));
  },

  /** Sessions, jars and live incidents per operator, grouped in the database. */
  async counts(): Promise<Map<number, OperatorCounts>> {
    const rows = await dataSource.query<Raw[]>(
      `SELECT s.operatorId AS userId, COUNT(DISTINCT s.id) AS sessions, COUNT(DISTINCT j.id) AS jars,
              COUNT(DISTINCT lij.jarId) AS contaminatedJars, COUNT(DISTINCT lij.incidentId) AS incidents
       FROM inoculation_sessions s
       LEFT JOIN jars j ON j.sessionId = s.id
       LEFT JOIN ${liveIncidentJars} lij ON lij.jarId = j.id
       WHERE s.operatorId IS NOT NULL
       GROUP BY s.operatorId`,
    );
    return new Map(
      rows.map((r) => [
        Number(r.userId),
        {
          sessions: Number(r.sessions),
          jars: Number(r.jars),
          contaminatedJars: Number(r.contaminatedJars),
          incidents: Number(r.incidents),
        },
      ]),
    );
  },

  async training(procedureId: number, currentVersionId: number | null): Promise<Map<number, OperatorTraining>> {
    const rows = await dataSource.query<Raw[]>(
      `SELECT t.userId AS userId, MAX(v.version) AS trainedVersion, MAX(t.trainedOn) AS lastTrainedOn,
              MAX(CASE WHEN t.procedureVersionId = ? THEN 1 ELSE 0 END) AS onCurrent
       FROM training_records t JOIN procedure_versions v ON v.id = t.procedureVersionId
       WHERE v.procedureId = ? AND t.userId IS NOT NULL
       GROUP BY t.userId`,
      [currentVersionId ?? 0, procedureId],
    );
    return new Map(
      rows.map((r) => [
        Number(r.userId),
        {
          trainedVersion: Number(r.trainedVersion),
          lastTrainedOn: day(r.lastTrainedOn),
          trainedOnCurrent: Number(r.onCurrent) === 1,
        },
      ]),
    );
  },

  async openRequests(procedureId: number): Promise<Map<number, number>> {
    const rows = await dataSource.query<Raw[]>(
      `SELECT r.userId AS userId, COUNT(*) AS n FROM retraining_requests r
       JOIN procedure_versions v ON v.id = r.procedureVersionId
       WHERE v.procedureId = ? AND r.doneAt IS NULL GROUP BY r.userId`,
      [procedureId],
    );
    return new Map(rows.map((r) => [Number(r.userId), Number(r.n)]));
  },

  firstProcedureId: async (): Promise<number | undefined> => {
    const rows = await dataSource.query<Raw[]>('SELECT MIN(id) AS id FROM procedures');
    return rows[0]?.id === null || rows[0]?.id === undefined ? undefined : Number(rows[0].id);
  },
};
