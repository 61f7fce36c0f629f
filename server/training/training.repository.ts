import type { EntityManager, SelectQueryBuilder } from 'typeorm';
import type {
  RetrainRequestDto,
  RetrainRequestListQuery,
  TrainingRecordDto,
  TrainingRecordListQuery,
} from '../../shared/schemas/training';
import { inIdOrder, pageIds, type PageTotal } from '../core/paging';
import { dateOnly, numberOrNull } from '../core/raw-values';
import { dataSource } from '../db/data-source';
import { ProcedureVersion } from '../procedures/procedure-version.entity';
import { User } from '../users/user.entity';
import { StaffMember } from '../staff/staff-member.entity';
import { RetrainRequest } from './retrain-request.entity';
import { TrainingRecord } from './training-record.entity';

type Raw = Record<string, unknown>;
/** A user or a staff person: exactly one id is set. */
export interface PersonKey {
  userId: number | null;
  staffId: number | null;
}
const iso = (v: unknown) => (v === null || v === undefined ? null : new Date(v as string | Date).toISOString());

const recordSortable = { trainedOn: 't.trainedOn', personName: 't.personName', createdAt: 't.createdAt' };
const requestSortable = { createdAt: 'r.createdAt', doneAt: 'r.doneAt' };

function recordQuery(m: EntityManager): SelectQueryBuilder<TrainingRecord> {
  return m
    .createQueryBuilder(TrainingRecord, 't')
    .innerJoin(ProcedureVersion, 'v', 'v.id = t.procedureVersionId')
    .select([
      't.id AS id',
      't.userId AS userId',
      't.staffId AS staffId',
      't.personName AS personName',
      'v.procedureId AS procedureId',
      'v.title AS procedureTitle',
      't.procedureVersionId AS procedureVersionId',
      'v.version AS version',
      't.trainerId AS trainerId',
      't.trainerName AS trainerName',
      't.trainedOn AS trainedOn',
      't.notes AS notes',
      't.createdAt AS createdAt',
    ]);
}

const toRecordDto = (r: Raw): TrainingRecordDto => ({
  id: Number(r.id),
  userId: numberOrNull(r.userId),
  staffId: numberOrNull(r.staffId),
  personName: String(r.personName),
  procedureId: Number(r.procedureId),
  procedureTitle: String(r.procedureTitle),
  procedureVersionId: Number(r.procedureVersionId),
  version: Number(r.version),
  trainerId: numberOrNull(r.trainerId),
  trainerName: String(r.trainerName),
  trainedOn: dateOnly(r.trainedOn as Date | string),
  notes: (r.notes as string | null) ?? null,
  createdAt: iso(r.createdAt) ?? '',
});

function requestQuery(m: EntityManager): SelectQueryBuilder<RetrainRequest> {
  return m
    .createQueryBuilder(RetrainRequest, 'r')
    .innerJoin(ProcedureVersion, 'v', 'v.id = r.procedureVersionId')
    .leftJoin(User, 'u', 'u.id = r.userId')
    .leftJoin(StaffMember, 'sm', 'sm.id = r.staffId')
    .leftJoin(User, 'rb', 'rb.id = r.requestedById')
    .select([
      'r.id AS id',
      'r.userId AS userId',
      'r.staffId AS staffId',
      'COALESCE(u.displayName, sm.name) AS userName',
      'v.procedureId AS procedureId',
      'v.title AS procedureTitle',
      'r.procedureVersionId AS procedureVersionId',
      'v.version AS version',
      'r.requestedById AS requestedById',
      'rb.displayName AS requestedByName',
      'r.reason AS reason',
      'r.doneAt AS doneAt',
      'r.createdAt AS createdAt',
    ]);
}

const toRequestDto = (r: Raw): RetrainRequestDto => ({
  id: Number(r.id),
  userId: numberOrNull(r.userId),
  staffId: numberOrNull(r.staffId),
  userName: String(r.userName),
  procedureId: Number(r.procedureId),
  procedureTitle: String(r.procedureTitle),
  procedureVersionId: Number(r.procedureVersionId),
  version: Number(r.version),
  requestedById: numberOrNull(r.requestedById),
  requestedByName: (r.requestedByName as string | null) ?? null,
  reason: (r.reason as string | null) ?? null,
  doneAt: iso(r.doneAt),
  createdAt: iso(r.createdAt) ?? '',
});

export const trainingRepository = {
  insertRecord: (m: EntityManager, fields: Partial<TrainingRecord>) => m.save(m.create(TrainingRecord, fields)),
  insertRequest: (m: EntityManager, fields: Partial<RetrainRequest>) => m.save(m.create(RetrainRequest, fields)),
  closeRequest: (m: EntityManager, id: number, doneAt: Date) => m.update(RetrainRequest, { id }, { doneAt }),

  async listRecords(q: TrainingRecordListQuery): Promise<[TrainingRecordDto[], PageTotal]> {
    const qb = dataSource.manager.createQueryBuilder(TrainingRecord, 't');
    if (q.userId) qb.andWhere('t.userId = :userId', { userId: q.userId });
    if (q.staffId) qb.andWhere('t.staffId = :staffId', { staffId: q.staffId });
    if (q.procedureId) {
      qb.andWhere(
        't.procedureVersionId IN (SELECT pv.id FROM procedure_versions pv WHERE pv.procedureId = :procedureId)',
        {
          procedureId: q.procedureId,
        },
      );
    }
    if (q.procedureVersionId) qb.andWhere('t.procedureVersionId = :pv', { pv: q.procedureVersionId });
    const [ids, total] = await pageIds(qb, q, {
      sortable: recordSortable,
      defaultSort: '-trainedOn',
      tieBreak: 't.id',
    });
    if (ids.length === 0) return [[], total];
    const rows = await recordQuery(dataSource.manager).where('t.id IN (:...ids)', { ids }).getRawMany<Raw>();
    return [inIdOrder(ids, rows.map(toRecordDto), (r) => r.id), total];
  },

  async findRecord(id: number): Promise<TrainingRecordDto | undefined> {
    const row = await recordQuery(dataSource.manager).where('t.id = :id', { id }).getRawOne<Raw>();
    return row ? toRecordDto(row) : undefined;
  },

  /** Open requests this training answers: the same procedure, at this version or an older one. */
  openRequestsAnswered: (m: EntityManager, person: PersonKey, procedureId: number, version: number) =>
    m
      .createQueryBuilder(RetrainRequest, 'r')
      .innerJoin(ProcedureVersion, 'v', 'v.id = r.procedureVersionId')
      .where(person.userId ? 'r.userId = :id' : 'r.staffId = :id', { id: person.userId ?? person.staffId })
      .andWhere('r.doneAt IS NULL')
      .andWhere('v.procedureId = :procedureId AND v.version <= :version', { procedureId, version })
      .getMany(),

  async listRequests(q: RetrainRequestListQuery): Promise<[RetrainRequestDto[], PageTotal]> {
    const qb = dataSource.manager.createQueryBuilder(RetrainRequest, 'r');
    if (q.userId) qb.andWhere('r.userId = :userId', { userId: q.userId });
    if (q.staffId) qb.andWhere('r.staffId = :staffId', { staffId: q.staffId });
    if (q.open) qb.andWhere(q.open === 'true' ? 'r.doneAt IS NULL' : 'r.doneAt IS NOT NULL');
    const [ids, total] = await pageIds(qb, q, {
      sortable: requestSortable,
      defaultSort: '-createdAt',
      tieBreak: 'r.id',
    });
    if (ids.length === 0) return [[], total];
    const rows = await requestQuery(dataSource.manager).where('r.id IN (:...ids)', { ids }).getRawMany<Raw>();
    return [inIdOrder(ids, rows.map(toRequestDto), (r) => r.id), total];
  },

  async findRequest(id: number): Promise<RetrainRequestDto | undefined> {
    const row = await requestQuery(dataSource.manager).where('r.id = :id', { id }).getRawOne<Raw>();
    return row ? toRequestDto(row) : undefined;
  },
};
