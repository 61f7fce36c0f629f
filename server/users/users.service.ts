import bcrypt from 'bcryptjs';
import type { CreateUserInput, UpdateUserInput, UserListQuery } from '../../shared/schemas/users';
import type { Page } from '../../shared/schemas/common';
import type { UserDto } from '../../shared/schemas/users';
import { diffEntries, recordAudit, type Actor } from '../audit/audit.service';
import { config } from '../core/config';
import { badRequest, conflict, notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { User } from './user.entity';
import { usersRepository } from './users.repository';
import { toUserDto } from './users.mapper';

export const hashPassword = (password: string) => bcrypt.hash(password, config().PASSWORD_HASH_ROUNDS);

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
    const user = await m.save(
      m.create(User, {
        username: input.username,
        displayName: input.displayName,
        email: input.email || null,
        role: input.role,
        passwordHash,
        active: true,
      }),
    );
    await recordAudit(m, actor, [{ action: 'create', recordType: 'user', recordId: user.id, newValue: { username: user.username, role: user.role } }]);
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
    await m.save(user);
    await recordAudit(m, actor, entries);
    return toUserDto(user);
  });
}
