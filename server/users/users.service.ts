import bcrypt from 'bcryptjs';
import type { EntityManager } from 'typeorm';
import type { CreateUserInput, UpdateUserInput, UserListQuery } from '../../shared/schemas/users';
import type { Page } from '../../shared/schemas/common';
import type { PersonDto, UserDto } from '../../shared/schemas/users';
import { diffEntries, recordAudit, type Actor } from '../audit/audit.service';
import { config } from '../core/config';
import { badRequest, conflict, notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { usersRepository } from './users.repository';
import { toUserDto } from './users.mapper';

export const hashPassword = (password: string) => bcrypt.hash(password, config().PASSWORD_HASH_ROUNDS);

export interface OperatorFields {
  operatorId: number | null;
  operatorName: string | null;
}

/**
 * The operator of a record: a user id or a typed staff name. A user operator also keeps their name, so
 * the record reads the same after the account is gone. null: the input leaves the operator as it is.
 */
export async function resolveOperator(
  m: EntityManager,
  input: { operatorId?: number | null; operatorName?: string | null },
  { closedAccounts = false } = {},
): Promise<OperatorFields | null> {
  if (input.operatorId) {
    const user = closedAccounts
      ? await usersRepository.findById(input.operatorId, m)
      : await usersRepository.findActive(input.operatorId, m);
    if (!user)
      throw badRequest('operatorId: no such active user', [{ path: 'operatorId', message: 'is not an active user' }]);
    return { operatorId: user.id, operatorName: user.displayName };
  }
  if (input.operatorName) return { operatorId: null, operatorName: input.operatorName };
  if (input.operatorId === null || input.operatorName === null) return { operatorId: null, operatorName: null };
  return null;
}

export const findUser = (id: number) => usersRepository.findById(id);
export const findActiveUser = (m: EntityManager, id: number) => usersRepository.findActive(id, m);
export const findUserByUsername = (username: string) => usersRepository.findByUsername(username);
/** A password the person chose: nothing left to replace at next sign-in. */
export const setOwnPassword = (m: EntityManager, id: number, passwordHash: string) =>
  usersRepository.setOwnPassword(m, id, passwordHash);

export const noOperator: OperatorFields = { operatorId: null, operatorName: null };

/** Every account's id, username and display name, for matching the names a history file gives. */
export const accountNames = (m: EntityManager) => usersRepository.accountNames(m);

export async function listPeople(): Promise<PersonDto[]> {
  return (await usersRepository.activePeople()).map((u) => ({ id: u.id, displayName: u.displayName, role: u.role }));
}

export async function listUsers(q: UserListQuery): Promise<Page<UserDto>> {
  const [rows, total] = await usersRepository.list(q);
  return { items: rows.map(toUserDto), total, page: q.page, pageSize: q.pageSize };
}

export async function createUser(actor: Actor, input: CreateUserInput): Promise<UserDto> {
  if (await usersRepository.findByUsername(input.username)) {
    throw conflict('That username is taken.', [{ path: 'username', message: 'is already taken' }]);
  }
  const passwordHash = await hashPassword(input.password);
  return dataSource.transaction(async (m) => {
    const user = await usersRepository.insert(m, {
      username: input.username,
      displayName: input.displayName,
      email: input.email || null,
      role: input.role,
      passwordHash,
      active: true,
    });
    await recordAudit(m, actor, [
      {
        action: 'create',
        recordType: 'user',
        recordId: user.id,
        newValue: { username: user.username, role: user.role },
      },
    ]);
    return toUserDto(user);
  });
}

export async function updateUser(actor: Actor, id: number, input: UpdateUserInput): Promise<UserDto> {
  return dataSource.transaction(async (m) => {
    const user = await usersRepository.findById(id, m);
    if (!user) throw notFound('User');
    if (actor.id === id && (input.active === false || (input.role && input.role !== user.role))) {
      throw badRequest('You cannot change your own role or deactivate yourself.', [
        { path: input.active === false ? 'active' : 'role', message: 'cannot be changed on your own account' },
      ]);
    }
    const changes = { ...input, email: input.email === undefined ? undefined : input.email || null };
    const entries = diffEntries({ action: 'update', recordType: 'user', recordId: id }, user, changes);
    Object.assign(user, Object.fromEntries(Object.entries(changes).filter(([, v]) => v !== undefined)));
    await usersRepository.save(m, user);
    await recordAudit(m, actor, entries);
    return toUserDto(user);
  });
}
