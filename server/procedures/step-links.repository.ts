import type { EntityManager } from 'typeorm';
import type { StepLinkDto } from '../../shared/schemas/procedures';
import { dataSource } from '../db/data-source';
import { IncidentStepLink } from './incident-step-link.entity';
import { ProcedureStep } from './procedure-step.entity';
import { ProcedureVersion } from './procedure-version.entity';
import { Procedure } from './procedure.entity';

interface LinkRaw {
  id: number;
  incidentId: number;
  stepId: number;
  stepPosition: number;
  stepText: string;
  procedureId: number;
  procedureTitle: string;
  versionId: number;
  version: number;
  note: string | null;
  linkedById: number | null;
  linkedByName: string;
  createdAt: Date;
}

const linkQuery = (m: EntityManager) =>
  m
    .createQueryBuilder(IncidentStepLink, 'l')
    .innerJoin(ProcedureStep, 's', 's.id = l.stepId')
    .innerJoin(ProcedureVersion, 'v', 'v.id = s.versionId')
    .innerJoin(Procedure, 'p', 'p.id = v.procedureId')
    .select([
      'l.id AS id',
      'l.incidentId AS incidentId',
      'l.stepId AS stepId',
      's.position AS stepPosition',
      's.text AS stepText',
      'p.id AS procedureId',
      'v.title AS procedureTitle',
      'v.id AS versionId',
      'v.version AS version',
      'l.note AS note',
      'l.linkedById AS linkedById',
      'l.linkedByName AS linkedByName',
      'l.createdAt AS createdAt',
    ])
    .orderBy('l.createdAt', 'ASC')
    .addOrderBy('l.id', 'ASC');

const toDto = (r: LinkRaw): StepLinkDto => ({
  id: Number(r.id),
  incidentId: Number(r.incidentId),
  stepId: Number(r.stepId),
  stepPosition: Number(r.stepPosition),
  stepText: r.stepText,
  procedureId: Number(r.procedureId),
  procedureTitle: r.procedureTitle,
  versionId: Number(r.versionId),
  version: Number(r.version),
  note: r.note,
  linkedById: r.linkedById === null ? null : Number(r.linkedById),
  linkedByName: r.linkedByName,
  createdAt: new Date(r.createdAt).toISOString(),
});

export const stepLinksRepository = {
  async listForIncident(incidentId: number): Promise<StepLinkDto[]> {
    const rows = await linkQuery(dataSource.manager)
      .where('l.incidentId = :incidentId', { incidentId })
      .getRawMany<LinkRaw>();
    return rows.map(toDto);
  },

  async listForStep(stepId: number): Promise<StepLinkDto[]> {
    const rows = await linkQuery(dataSource.manager).where('l.stepId = :stepId', { stepId }).getRawMany<LinkRaw>();
    return rows.map(toDto);
  },

  async findDto(id: number): Promise<StepLinkDto | undefined> {
    const row = await linkQuery(dataSource.manager).where('l.id = :id', { id }).getRawOne<LinkRaw>();
    return row ? toDto(row) : undefined;
  },

  async stepWithVersion(stepId: number, m: EntityManager = dataSource.manager) {
    const row = await m
      .createQueryBuilder(ProcedureStep, 's')
      .innerJoin(ProcedureVersion, 'v', 'v.id = s.versionId')
      .select(['s.id AS id', 's.position AS position', 'v.version AS version', 'v.title AS procedureTitle'])
      .where('s.id = :stepId', { stepId })
      .getRawOne<{ id: number; position: number; version: number; procedureTitle: string }>();
    return row
      ? {
          id: Number(row.id),
          position: Number(row.position),
          version: Number(row.version),
          procedureTitle: row.procedureTitle,
        }
      : undefined;
  },

  exists: (incidentId: number, stepId: number) => dataSource.manager.existsBy(IncidentStepLink, { incidentId, stepId }),
  findById: (m: EntityManager, id: number) => m.findOneBy(IncidentStepLink, { id }),
  insert: (m: EntityManager, fields: Partial<IncidentStepLink>) => m.save(m.create(IncidentStepLink, fields)),
  delete: (m: EntityManager, id: number) => m.delete(IncidentStepLink, { id }),
};
