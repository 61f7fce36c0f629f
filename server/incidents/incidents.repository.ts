import { In, type EntityManager, type QueryDeepPartialEntity, type SelectQueryBuilder } from 'typeorm';
import { contaminantNames, contaminants } from '../../shared/enums';
import type { IncidentFilters, IncidentListQuery } from '../../shared/schemas/incidents';
import { AuditEvent } from '../audit/audit-event.entity';
import { applySortAndPage, likePrefix, pageSorted, whereDateRange } from '../core/paging';
import { insertMany } from '../db/bulk';
import { dataSource } from '../db/data-source';
import { Jar } from '../jars/jar.entity';
import { IncidentStepLink } from '../procedures/incident-step-link.entity';
import { CorrectiveAction } from './corrective-action.entity';
import { IncidentJar } from './incident-jar.entity';
import { IncidentPhoto } from './incident-photo.entity';
import { Incident } from './incident.entity';

const sortable = {
  foundAt: 'i.foundAt',
  id: 'i.id',
  contaminant: 'i.contaminant',
  status: 'i.status',
  verdict: 'i.verdict',
  severity: 'i.severity',
  stage: 'i.stage',
};

/** A filter on the incident's jars: true when any jar of the incident matches. */
const anyJar = (condition: string) =>
  `EXISTS (SELECT 1 FROM incident_jars f_ij JOIN jars f_j ON f_j.id = f_ij.jarId LEFT JOIN inoculation_sessions f_s ON f_s.id = f_j.sessionId WHERE f_ij.incidentId = i.id AND ${condition})`;

/** The picker's one box: "#88" or "88" is a number; else a jar label, an operator or a contaminant. */
function whereFound(qb: SelectQueryBuilder<Incident>, q: string) {
  const term = q.replace(/^#\s*/, '');
  if (term !== q && /^\d+$/.test(term)) {
    qb.andWhere('i.id = :qId', { qId: Number(term) });
    return;
  }
  const lower = term.toLowerCase();
  const codes = contaminants.filter((c) => c.includes(lower) || contaminantNames[c].toLowerCase().includes(lower));
  const ors = [anyJar('(f_j.label LIKE :qJar OR f_s.operatorName LIKE :qOperator)')];
  if (/^\d+$/.test(term)) ors.unshift('i.id = :qId');
  if (codes.length) ors.push('i.contaminant IN (:...qCodes)');
  qb.andWhere(`(${ors.join(' OR ')})`, {
    qId: Number(term),
    qJar: likePrefix(term),
    qOperator: `%${term.replace(/[\\%_]/g, '\\$&')}%`,
    qCodes: codes,
  });
}

function filtered(f: IncidentFilters): SelectQueryBuilder<Incident> {
  const qb = dataSource.manager.createQueryBuilder(Incident, 'i');
  if (f.status) qb.andWhere('i.status = :status', { status: f.status });
  if (f.verdict) qb.andWhere('i.verdict = :verdict', { verdict: f.verdict });
  if (f.contaminant) qb.andWhere('i.contaminant = :contaminant', { contaminant: f.contaminant });
  if (f.voided) qb.andWhere('i.voided = :voided', { voided: f.voided === 'true' });
  whereDateRange(qb, 'i.foundOn', f);
  if (f.cookRunId) qb.andWhere(anyJar('f_j.cookRunId = :cookRunId'), { cookRunId: f.cookRunId });
  if (f.cultureId) qb.andWhere(anyJar('f_j.cultureId = :cultureId'), { cultureId: f.cultureId });
  if (f.sessionId) qb.andWhere(anyJar('f_j.sessionId = :sessionId'), { sessionId: f.sessionId });
  if (f.operator) qb.andWhere(anyJar('f_s.operatorName = :operator'), { operator: f.operator });
  if (f.jar) qb.andWhere(anyJar('f_j.label LIKE :jar'), { jar: likePrefix(f.jar) });
  if (f.q) whereFound(qb, f.q);
  return qb;
}

export interface JarCodes {
  labels: string[];
  cookRuns: string[];
  cultures: string[];
  sessions: string[];
}

export const incidentsRepository = {
  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(Incident, { id }),

  /** Row lock for the length of the transaction: two reviewers are served one after the other. */
  lockById: (m: EntityManager, id: number) =>
    m.createQueryBuilder(Incident, 'i').setLock('pessimistic_write').where('i.id = :id', { id }).getOne(),

  insert: (m: EntityManager, fields: Partial<Incident>) => m.save(m.create(Incident, fields)),
  save: (m: EntityManager, incident: Incident) => m.save(incident),
  anyFiled: () => dataSource.manager.existsBy(Incident, { imported: false }),
  insertMany: (m: EntityManager, rows: QueryDeepPartialEntity<Incident>[]) => insertMany(m, Incident, rows),

  list: (q: IncidentListQuery) => pageSorted(filtered(q), q, { sortable, defaultSort: '-foundAt', tieBreak: 'i.id' }),

  listAll: (f: IncidentFilters, sort: string | undefined, cap: number) =>
    applySortAndPage(filtered(f), { page: 1, pageSize: cap, sort }, sortable, '-foundAt', 'i.id').getMany(),

  /** Labels and production codes of each incident's jars, for the list and the CSV. */
  async jarCodes(incidentIds: number[]): Promise<Map<number, JarCodes>> {
    const out = new Map<number, JarCodes>(
      incidentIds.map((id) => [id, { labels: [], cookRuns: [], cultures: [], sessions: [] }]),
    );
    if (incidentIds.length === 0) return out;
    const rows: {
      incidentId: number;
      label: string;
      cookRun: string | null;
      culture: string | null;
      session: string | null;
    }[] = await dataSource.manager
      .createQueryBuilder()
      .select([
        'ij.incidentId AS incidentId',
        'j.label AS label',
        'cr.code AS cookRun',
        'c.code AS culture',
        's.code AS session',
      ])
      .from(IncidentJar, 'ij')
      .innerJoin(Jar, 'j', 'j.id = ij.jarId')
      .leftJoin('cook_runs', 'cr', 'cr.id = j.cookRunId')
      .leftJoin('cultures', 'c', 'c.id = j.cultureId')
      .leftJoin('inoculation_sessions', 's', 's.id = j.sessionId')
      .where('ij.incidentId IN (:...ids)', { ids: incidentIds })
      .orderBy('j.label', 'ASC')
      .getRawMany();
    const add = (list: string[], v: string | null) => v !== null && !list.includes(v) && list.push(v);
    for (const r of rows) {
      const entry = out.get(Number(r.incidentId));
      if (!entry) continue;
      add(entry.labels, r.label);
      add(entry.cookRuns, r.cookRun);
      add(entry.cultures, r.culture);
      add(entry.sessions, r.session);
    }
    return out;
  },

  async photoCounts(incidentIds: number[]): Promise<Map<number, number>> {
    if (incidentIds.length === 0) return new Map();
    const rows: { incidentId: number; n: string }[] = await dataSource.manager
      .createQueryBuilder(IncidentPhoto, 'ip')
      .select('ip.incidentId', 'incidentId')
      .addSelect('COUNT(*)', 'n')
      .where('ip.incidentId IN (:...ids)', { ids: incidentIds })
      .groupBy('ip.incidentId')
      .getRawMany();
    return new Map(rows.map((r) => [Number(r.incidentId), Number(r.n)]));
  },

  jarIdsOf: async (m: EntityManager, incidentId: number) =>
    (await m.findBy(IncidentJar, { incidentId })).map((r) => r.jarId),

  insertJarLinks: (m: EntityManager, rows: Pick<IncidentJar, 'incidentId' | 'jarId'>[]) => m.insert(IncidentJar, rows),
  photoIdsOf: async (m: EntityManager, incidentId: number) =>
    (await m.findBy(IncidentPhoto, { incidentId })).map((l) => l.photoId),
  insertPhotoLinks: (m: EntityManager, rows: Pick<IncidentPhoto, 'incidentId' | 'photoId' | 'addedById'>[]) =>
    m.insert(IncidentPhoto, rows),

  findJarsByIds: (m: EntityManager, ids: number[]) =>
    ids.length ? m.findBy(Jar, { id: In(ids) }) : Promise.resolve([]),
  findJarsByLabels: (m: EntityManager, labels: string[]) =>
    labels.length ? m.findBy(Jar, { label: In(labels) }) : Promise.resolve([]),

  actionsOf: (incidentId: number) =>
    dataSource.manager.find(CorrectiveAction, { where: { incidentId }, order: { dueOn: 'ASC', id: 'ASC' } }),

  stepLinkIdsOf: async (incidentId: number) =>
    (await dataSource.manager.find(IncidentStepLink, { where: { incidentId }, select: { id: true } })).map((l) => l.id),

  /** The incident's own events and those of its corrective actions and step links, oldest first. */
  history(incidentId: number, actionIds: number[], linkIds: number[]): Promise<AuditEvent[]> {
    const qb = dataSource.manager
      .createQueryBuilder(AuditEvent, 'a')
      .where("(a.recordType = 'incident' AND a.recordId = :id)", { id: String(incidentId) });
    if (actionIds.length)
      qb.orWhere("(a.recordType = 'corrective-action' AND a.recordId IN (:...actionIds))", {
        actionIds: actionIds.map(String),
      });
    if (linkIds.length)
      qb.orWhere("(a.recordType = 'incident-step-link' AND a.recordId IN (:...linkIds))", {
        linkIds: linkIds.map(String),
      });
    return qb.orderBy('a.at', 'ASC').addOrderBy('a.id', 'ASC').getMany();
  },
};
