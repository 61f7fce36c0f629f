import type { Page } from '../../shared/schemas/common';
import type {
  CreateRetrainRequestInput,
  CreateTrainingRecordInput,
  RetrainRequestDto,
  RetrainRequestListQuery,
  TrainingRecordDto,
  TrainingRecordListQuery,
} from '../../shared/schemas/training';
import { recordAudit, type Actor, type AuditEntry } from '../audit/audit.service';
import type { SessionUser } from '../core/auth-guards';
import { notFound, unprocessable } from '../core/errors';
import { pageResult } from '../core/paging';
import { dataSource } from '../db/data-source';
import { notifyRetrainRequested } from '../mail/retraining-mail.service';
import { findVersion, getProcedureVersion } from '../procedures/procedures.service';
import { requireActiveStaff } from '../staff/staff.service';
import { findUser } from '../users/users.service';
import { trainingRepository } from './training.repository';

/** The person trained or asked to retrain: an active user or an active staff person. */
async function requirePerson(input: { userId?: number; staffId?: number }) {
  if (input.staffId !== undefined) {
    const member = await requireActiveStaff(input.staffId);
    return { userId: null, staffId: member.id, name: member.name };
  }
  // The schema gives exactly one of userId and staffId.
  const user = await findUser(input.userId as number);
  if (!user) throw notFound('User');
  if (!user.active)
    throw unprocessable('That account is deactivated.', [{ path: 'userId', message: 'is a deactivated account' }]);
  return { userId: user.id, staffId: null, name: user.displayName };
}

async function requireVersion(id: number) {
  const version = await findVersion(id);
  if (!version) throw notFound('Procedure version');
  return version;
}

/** A technician sees only their own records and requests; the other roles see everyone's. */
const ownUnlessStaff = (viewer: SessionUser, userId: number | undefined) =>
  viewer.role === 'technician' ? viewer.id : userId;

export async function listTrainingRecords(
  viewer: SessionUser,
  q: TrainingRecordListQuery,
): Promise<Page<TrainingRecordDto>> {
  const [items, total] = await trainingRepository.listRecords({ ...q, userId: ownUnlessStaff(viewer, q.userId) });
  return pageResult(items, total, q);
}

/** Records the training and closes the person's open retraining requests that it answers. */
export async function createTrainingRecord(actor: Actor, input: CreateTrainingRecordInput): Promise<TrainingRecordDto> {
  const person = await requirePerson(input);
  const version = await requireVersion(input.procedureVersionId);
  const id = await dataSource.transaction(async (m) => {
    const record = await trainingRepository.insertRecord(m, {
      userId: person.userId,
      staffId: person.staffId,
      personName: person.name,
      procedureVersionId: version.id,
      trainerId: actor.id,
      trainerName: actor.displayName,
      trainedOn: input.trainedOn,
      notes: input.notes,
    });
    const answered = await trainingRepository.openRequestsAnswered(m, person, version.procedureId, version.version);
    const now = new Date();
    for (const r of answered) await trainingRepository.closeRequest(m, r.id, now);
    const entries: AuditEntry[] = [
      {
        action: 'create',
        recordType: 'training-record',
        recordId: record.id,
        newValue: {
          userId: person.userId,
          staffId: person.staffId,
          procedureVersionId: version.id,
          version: version.version,
          trainedOn: input.trainedOn,
        },
      },
      ...answered.map((r) => ({
        action: 'close',
        recordType: 'retraining-request',
        recordId: r.id,
        field: 'doneAt',
        oldValue: null,
        newValue: now,
        reason: `answered by training record ${record.id}`,
      })),
    ];
    await recordAudit(m, actor, entries);
    return record.id;
  });
  const dto = await trainingRepository.findRecord(id);
  if (!dto) throw notFound('Training record');
  return dto;
}

export async function listRetrainRequests(
  viewer: SessionUser,
  q: RetrainRequestListQuery,
): Promise<Page<RetrainRequestDto>> {
  const [items, total] = await trainingRepository.listRequests({ ...q, userId: ownUnlessStaff(viewer, q.userId) });
  return pageResult(items, total, q);
}

export async function createRetrainRequest(actor: Actor, input: CreateRetrainRequestInput): Promise<RetrainRequestDto> {
  const person = await requirePerson(input);
  const version = await requireVersion(input.procedureVersionId);
  const id = await dataSource.transaction(async (m) => {
    const request = await trainingRepository.insertRequest(m, {
      userId: person.userId,
      staffId: person.staffId,
      procedureVersionId: version.id,
      requestedById: actor.id,
      reason: input.reason,
    });
    await recordAudit(m, actor, [
      {
        action: 'create',
        recordType: 'retraining-request',
        recordId: request.id,
        newValue: {
          userId: person.userId,
          staffId: person.staffId,
          procedureVersionId: version.id,
          version: version.version,
        },
        reason: input.reason,
      },
    ]);
    return request.id;
  });
  const detail = await getProcedureVersion(version.id);
  // A staff person has no account to read the request in; they are told by the trainer.
  const mailed =
    person.userId === null
      ? false
      : await notifyRetrainRequested(person.userId, {
          requestedByName: actor.displayName,
          reason: input.reason,
          procedureTitle: detail.title,
          version: detail.version,
          procedureVersionId: detail.id,
          steps: detail.steps,
        });
  const dto = await trainingRepository.findRequest(id);
  if (!dto) throw notFound('Retraining request');
  return { ...dto, mailed };
}
