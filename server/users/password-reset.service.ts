import { randomInt } from 'node:crypto';
import type { PasswordResetDto, ResetPasswordInput } from '../../shared/schemas/users';
import { recordAudit, type Actor } from '../audit/audit.service';
import { endOtherSessions } from '../auth/session-records';
import { badRequest, notFound } from '../core/errors';
import { dataSource } from '../db/data-source';
import { usersRepository } from './users.repository';
import { toUserDto } from './users.mapper';
import { hashPassword } from './users.service';

// No 0/O or 1/l/I: the admin reads it aloud or writes it on paper.
const alphabet = 'abcdefghjkmnpqrstuvwxyzABCDEFGHJKLMNPQRSTUVWXYZ23456789';

/** 14 characters of a 55-letter alphabet: about 81 bits, from the operating system's random source. */
export function generatePassword(length = 14): string {
  return Array.from({ length }, () => alphabet[randomInt(alphabet.length)]).join('');
}

/**
 * Sets a temporary password the person must replace at next sign-in and signs them out everywhere,
 * so a session opened with the old password does not outlive the reset.
 */
export async function resetPassword(actor: Actor, id: number, input: ResetPasswordInput): Promise<PasswordResetDto> {
  if (actor.id === id) {
    throw badRequest('Change your own password on your account page.', [
      { path: 'temporaryPassword', message: 'cannot reset your own password here' },
    ]);
  }
  const generated = input.temporaryPassword ? null : generatePassword();
  const passwordHash = await hashPassword(input.temporaryPassword || (generated as string));
  return dataSource.transaction(async (m) => {
    const user = await usersRepository.findById(id, m);
    if (!user) throw notFound('User');
    Object.assign(user, { passwordHash, mustChangePassword: true });
    await usersRepository.save(m, user);
    const ended = await endOtherSessions(m, id, '');
    await recordAudit(m, actor, [
      {
        action: 'reset-password',
        recordType: 'user',
        recordId: id,
        field: 'password',
        newValue: { chosenBy: generated ? 'server' : 'admin', sessionsEnded: ended },
      },
    ]);
    return { user: toUserDto(user), generatedPassword: generated };
  });
}
