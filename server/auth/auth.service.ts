import bcrypt from 'bcryptjs';
import type { ChangePasswordInput } from '../../shared/schemas/auth';
import type { SessionUser } from '../core/auth-guards';
import { AppError, badRequest, notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { recordAudit } from '../audit/audit.service';
import { User } from '../users/user.entity';
import { toMeDto } from '../users/users.mapper';
import { hashPassword } from '../users/users.service';
import { isLoginBlocked, recordLoginFailure } from './login-limit.service';

// Compared against when the username is unknown, so both paths take the same time.
const decoyHash = bcrypt.hashSync('asepta-decoy-password', 10);

export const tooManyAttempts = () =>
  new AppError(429, 'too-many-attempts', 'Too many failed sign-ins. Wait 15 minutes and try again.');
export const invalidCredentials = () => new AppError(401, 'invalid-credentials', 'Username or password is wrong.');

export async function verifyLogin(username: string, password: string, address: string): Promise<SessionUser> {
  if (await isLoginBlocked(username, address)) throw tooManyAttempts();
  const user = await dataSource.manager.findOneBy(User, { username });
  const ok = await bcrypt.compare(password, user?.passwordHash ?? decoyHash);
  if (!user || !ok || !user.active) {
    await recordLoginFailure(username, address);
    throw invalidCredentials();
  }
  return toMeDto(user);
}

export async function loadSessionUser(id: number): Promise<SessionUser | null> {
  const user = await dataSource.manager.findOneBy(User, { id });
  return user?.active ? toMeDto(user) : null;
}

export async function changePassword(actor: SessionUser, input: ChangePasswordInput): Promise<void> {
  const user = await dataSource.manager.findOneBy(User, { id: actor.id });
  if (!user) throw notFound('User');
  if (!(await bcrypt.compare(input.currentPassword, user.passwordHash))) {
    throw badRequest('The current password is wrong.', [{ path: 'currentPassword', message: 'is wrong' }]);
  }
  const passwordHash = await hashPassword(input.newPassword);
  await dataSource.transaction(async (m) => {
    await m.update(User, { id: user.id }, { passwordHash });
    await recordAudit(m, actor, [
      { action: 'change-password', recordType: 'user', recordId: user.id, field: 'password' },
    ]);
  });
}
