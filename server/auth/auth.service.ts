import bcrypt from 'bcryptjs';
import type { ChangePasswordInput } from '../../shared/schemas/auth';
import type { SessionUser } from '../core/auth-guards';
import { AppError, badRequest, notFound } from '../core/errors';
import { config } from '../core/config';
import { dataSource } from '../db/data-source';
import { recordAudit } from '../audit/audit.service';
import { toMeDto } from '../users/users.mapper';
import { findUser, findUserByUsername, hashPassword, setOwnPassword } from '../users/users.service';
import { forgiveAttempt, reserveLoginAttempt } from './login-limit.service';
import { endOtherSessions } from './session-records';

let decoy: string | undefined;
/**
 * Compared against when the username is unknown; made at the configured cost, so an unknown
 * name takes as long to refuse as a known one and timing does not tell which names exist.
 */
const decoyHash = () => (decoy ??= bcrypt.hashSync('asepta-decoy-password', config().PASSWORD_HASH_ROUNDS));

export const invalidCredentials = () => new AppError(401, 'invalid-credentials', 'Username or password is wrong.');

export async function verifyLogin(username: string, password: string, address: string): Promise<SessionUser> {
  const attempt = await reserveLoginAttempt(username, address);
  const user = await findUserByUsername(username);
  const ok = await bcrypt.compare(password, user?.passwordHash ?? decoyHash());
  // The reserved attempt stays counted as the failure.
  if (!user || !ok || !user.active) throw invalidCredentials();
  await forgiveAttempt(attempt);
  return toMeDto(user);
}

export async function loadSessionUser(id: number): Promise<SessionUser | null> {
  const user = await findUser(id);
  return user?.active ? toMeDto(user) : null;
}

/**
 * Guesses at the current password count like failed sign-ins. The new password ends every other
 * session of the user, in the same transaction, so a stolen session does not outlive the change.
 */
export async function changePassword(
  actor: SessionUser,
  input: ChangePasswordInput,
  from: { address: string; sessionId: string },
): Promise<void> {
  const user = await findUser(actor.id);
  if (!user) throw notFound('User');
  const attempt = await reserveLoginAttempt(user.username, from.address);
  if (!(await bcrypt.compare(input.currentPassword, user.passwordHash))) {
    throw badRequest('The current password is wrong.', [{ path: 'currentPassword', message: 'is wrong' }]);
  }
  await forgiveAttempt(attempt);
  if (input.newPassword === input.currentPassword) {
    throw badRequest('Choose a password different from the current one.', [
      { path: 'newPassword', message: 'must differ from the current password' },
    ]);
  }
  const passwordHash = await hashPassword(input.newPassword);
  await dataSource.transaction(async (m) => {
    await setOwnPassword(m, user.id, passwordHash);
    const ended = await endOtherSessions(m, user.id, from.sessionId);
    await recordAudit(m, actor, [
      {
        action: 'change-password',
        recordType: 'user',
        recordId: user.id,
        field: 'password',
        newValue: { otherSessionsEnded: ended },
      },
    ]);
  });
}
