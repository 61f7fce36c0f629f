import type { EntityManager } from 'typeorm';
import type { PageQuery } from '../../shared/schemas/common';
import { applySortAndPage } from '../core/paging';
import { dataSource } from '../db/data-source';
import { Incident } from '../incidents/incident.entity';
import { User } from '../users/user.entity';
import { IncidentStepLink } from './incident-step-link.entity';
import { ProcedureStep } from './procedure-step.entity';
import { ProcedureVersion } from './procedure-version.entity';
import { Procedure } from './procedure.entity';

export interface VersionRow extends ProcedureVersion {
  publishedByName: string | null;
  stepCount: number;
}

export interface StepRow extends ProcedureStep {
  incidentsLinked: number;
}

const sortable = { code: 'p.code', title: 'p.title', createdAt: 'p.createdAt' };

export const proceduresRepository = {
  list(q: PageQuery): Promise<[Procedure[], number]> {
    const qb = dataSource.manager.createQueryBuilder(Procedure, 'p');
    applySortAndPage(qb, q, sortable, 'title', 'p.id');
    return qb.getManyAndCount();
  },

  findById: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(Procedure, { id }),
  findByCode: (code: string, m: EntityManager = dataSource.manager) => m.findOneBy(Procedure, { code }),
  lockById: (id: number, m: EntityManager) =>
    m.createQueryBuilder(Procedure, 'p').setLock('pessimistic_write').where('p.id = :id', { id }).getOne(),

  /** The newest version of each procedure: the one a session should follow. */
  async currentVersions(
    procedureIds: number[],
    m: EntityManager = dataSource.manager,
  ): Promise<Map<number, ProcedureVersion>> {
    if (procedureIds.length === 0) return new Map();
    const rows = await m
      .createQueryBuilder(ProcedureVersion, 'v')
      .where('v.procedureId IN (:...procedureIds)', { procedureIds })
      .andWhere('v.version = (SELECT MAX(v2.version) FROM procedure_versions v2 WHERE v2.procedureId = v.procedureId)')
      .getMany();
    return new Map(rows.map((v) => [v.procedureId, v]));
  },

  async versionsOf(procedureId: number): Promise<VersionRow[]> {
    const { entities, raw } = await dataSource.manager
      .createQueryBuilder(ProcedureVersion, 'v')
      .leftJoin(User, 'u', 'u.id = v.publishedById')
      .addSelect('u.displayName', 'publishedByName')
      .addSelect((sq) => sq.select('COUNT(*)').from(ProcedureStep, 's').where('s.versionId = v.id'), 'stepCount')
      .where('v.procedureId = :procedureId', { procedureId })
      .orderBy('v.version', 'DESC')
      .getRawAndEntities<{ publishedByName: string | null; stepCount: string }>();
    return entities.map((v, i) => ({
      ...v,
      publishedByName: raw[i]?.publishedByName ?? null,
      stepCount: Number(raw[i]?.stepCount ?? 0),
    }));
  },

  findVersion: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(ProcedureVersion, { id }),

  async publisherName(userId: number | null): Promise<string | null> {
    if (userId === null) return null;
    return (await dataSource.manager.findOneBy(User, { id: userId }))?.displayName ?? null;
  },

  /** Steps in order, each with the number of live (not voided) incidents linked to it. */
  async stepsOf(versionId: number): Promise<StepRow[]> {
    const { entities, raw } = await dataSource.manager
      .createQueryBuilder(ProcedureStep, 's')
      .addSelect(
        (sq) =>
          sq
            .select('COUNT(DISTINCT l.incidentId)')
            .from(IncidentStepLink, 'l')
            .innerJoin(Incident, 'i', 'i.id = l.incidentId AND i.voided = 0')
            .where('l.stepId = s.id'),
        'incidentsLinked',
      )
      .where('s.versionId = :versionId', { versionId })
      .orderBy('s.position', 'ASC')
      .getRawAndEntities<{ incidentsLinked: string }>();
    return entities.map((s, i) => ({ ...s, incidentsLinked: Number(raw[i]?.incidentsLinked ?? 0) }));
  },

  findStep: (id: number, m: EntityManager = dataSource.manager) => m.findOneBy(ProcedureStep, { id }),

  insert: (m: EntityManager, fields: Pick<Procedure, 'code' | 'title'>) => m.save(m.create(Procedure, fields)),
  setTitle: (m: EntityManager, id: number, title: string) => m.update(Procedure, { id }, { title }),
  insertVersion: (m: EntityManager, fields: Partial<ProcedureVersion>) => m.save(m.create(ProcedureVersion, fields)),
  insertSteps: (m: EntityManager, rows: Pick<ProcedureStep, 'versionId' | 'position' | 'text' | 'caution'>[]) =>
    m.insert(ProcedureStep, rows),
};
