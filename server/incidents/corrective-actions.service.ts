import type { EntityManager } from 'typeorm';
import type {
  CorrectiveActionDto,
  CreateActionInput,
  UpdateActionInput,
} from '../../shared/schemas/corrective-actions';
import { diffEntries, recordAudit } from '../audit/audit.service';
import type { SessionUser } from '../core/auth-guards';
import { AppError, notFound, unprocessable } from '../core/errors';
import { todayLocal } from '../core/local-time';
import { dataSource } from '../db/data-source';
import { notifyActionAssigned } from '../mail/action-mail.service';
import { findActiveUser } from '../users/users.service';
import type { CorrectiveAction } from './corrective-action.entity';
import { correctiveActionsRepository } from './corrective-actions.repository';
import { loadForChange } from './incident-rules';
import { toActionDto } from './incidents.mapper';

async function ownerName(m: EntityManager, ownerId: number): Promise<string> {
  const owner = await findActiveUser(m, ownerId);
  if (!owner)
    throw unprocessable(`ownerId: no active user has id ${ownerId}.`, [
      { path: 'ownerId', message: 'is not an active user' },
    ]);
  return owner.displayName;
}

export async function createAction(
  user: SessionUser,
  incidentId: number,
  input: CreateActionInput,
): Promise<CorrectiveActionDto> {
  const created = await dataSource.transaction(async (m) => {
    await loadForChange(m, incidentId);
    const name = input.ownerId !== undefined ? await ownerName(m, input.ownerId) : (input.ownerName ?? '');
    const action = await correctiveActionsRepository.insert(m, {
      incidentId,
      what: input.what,
      ownerId: input.ownerId ?? null,
      ownerName: name,
      ownerEmail: input.ownerId !== undefined ? null : (input.ownerEmail ?? null),
      dueOn: input.dueOn,
      factor: input.factor ?? null,
      level: input.level ?? null,
    });
    const { what, ownerName: owner, dueOn, factor, level } = action;
    await recordAudit(m, user, [
      {
        action: 'create',
        recordType: 'corrective-action',
        recordId: action.id,
        newValue: { incidentId, what, owner, dueOn, factor, level },
      },
    ]);
    return toActionDto(action, todayLocal());
  });
  await notifyActionAssigned(created.id);
  return created;
}

/** Marking an action done needs how the fix was verified (ISO 9001:2015 §10.2: check the action worked). */
function checkMerged(a: CorrectiveAction, today: string): void {
  if (a.doneOn !== null && !a.verification) {
    throw unprocessable('verification: say how the fix was verified before marking the action done.', [
      { path: 'verification', message: 'is required once the action is done' },
    ]);
  }
  if (a.doneOn !== null && a.doneOn > today) {
    throw unprocessable('doneOn: cannot be in the future.', [{ path: 'doneOn', message: 'cannot be in the future' }]);
  }
  if ((a.factor === null) !== (a.level === null)) {
    throw unprocessable('level: give both the factor and its level, or neither.', [
      { path: 'level', message: 'goes together with factor' },
    ]);
  }
}

export async function updateAction(
  user: SessionUser,
  id: number,
  input: UpdateActionInput,
): Promise<CorrectiveActionDto> {
  let reassigned = false;
  const updated = await dataSource.transaction(async (m) => {
    const action = await correctiveActionsRepository.findForUpdate(m, id);
    if (!action) throw notFound('Corrective action');
    try {
      await loadForChange(m, action.incidentId);
    } catch (err) {
      if (err instanceof AppError && err.code === 'voided')
        throw new AppError(409, 'voided', `The incident of action ${id} is voided; its actions can no longer change.`);
      throw err;
    }
    const { reason, ownerId, ownerName: typedOwner, ownerEmail, ...rest } = input;
    const changes: Partial<CorrectiveAction> = { ...rest };
    if (ownerId !== undefined) {
      Object.assign(changes, { ownerId, ownerName: await ownerName(m, ownerId), ownerEmail: null });
    } else if (typedOwner !== undefined) {
      Object.assign(changes, { ownerId: null, ownerName: typedOwner, ownerEmail: ownerEmail ?? null });
    } else if (ownerEmail !== undefined) {
      if (action.ownerId !== null)
        throw unprocessable('ownerEmail: a user is mailed at their account’s address.', [
          { path: 'ownerEmail', message: 'only a staff owner without an account takes an address' },
        ]);
      changes.ownerEmail = ownerEmail;
    }
    const entries = diffEntries(
      { action: 'update', recordType: 'corrective-action', recordId: id, reason: reason ?? null },
      action,
      changes,
    );
    const today = todayLocal();
    if (entries.length === 0) return toActionDto(action, today);
    reassigned = entries.some((e) => ['ownerId', 'ownerName', 'ownerEmail'].includes(e.field ?? ''));
    Object.assign(action, Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined)));
    checkMerged(action, today);
    await correctiveActionsRepository.save(m, action);
    await recordAudit(m, user, entries);
    return toActionDto(action, today);
  });
  if (reassigned && updated.doneOn === null) await notifyActionAssigned(id);
  return updated;
}
