import type { EntityManager } from 'typeorm';
import { AppError } from '../core/errors';
import { config } from '../core/config';
import { withNamedLock } from '../mail/named-lock';
import { authRepository } from './auth.repository';

const windowStart = () => new Date(Date.now() - config().LOGIN_WINDOW_MINUTES * 60_000);

export const tooManyAttempts = () =>
  new AppError(429, 'too-many-attempts', 'Too many failed sign-ins. Wait 15 minutes and try again.');

/**
 * Blocked when one username has reached the limit, when one address has failed on as many different
 * usernames (a spray), or when one address has failed LOGIN_ADDRESS_FAILURE_LIMIT times in all.
 * Counting distinct usernames keeps a colleague on the same lab network able to sign in while
 * someone else's account is locked; the overall count stops a slow guess at a few accounts.
 */
async function isLoginBlocked(m: EntityManager, username: string, address: string): Promise<boolean> {
  const c = config();
  // On the lock's own connection: waiters hold pool connections, so asking the pool could deadlock.
  const row = await authRepository.loginFailureCounts(m, username, address, windowStart());
  return (
    Number(row?.byUser ?? 0) >= c.LOGIN_FAILURE_LIMIT ||
    Number(row?.usernamesByAddress ?? 0) >= c.LOGIN_FAILURE_LIMIT ||
    Number(row?.byAddress ?? 0) >= c.LOGIN_ADDRESS_FAILURE_LIMIT
  );
}

export interface LoginAttempt {
  id: string;
}

/**
 * Checks the limits and counts the attempt as a failure in one step, under a MariaDB named lock
 * that every app instance shares: twenty guesses sent at once cannot all pass the check before
 * any is counted. A correct password takes the attempt back (forgiveAttempt).
 */
export async function reserveLoginAttempt(username: string, address: string): Promise<LoginAttempt> {
  const reserved = await withNamedLock('asepta-login-attempts', 10, async (m) => {
    if (await isLoginBlocked(m, username, address)) throw tooManyAttempts();
    const result = await authRepository.insertLoginFailure(m, {
      username: username.slice(0, 64),
      address: address.slice(0, 64),
      failedAt: new Date(),
    });
    return { id: String(result.identifiers[0]?.id) };
  });
  if (!reserved) throw new AppError(503, 'busy', 'Sign-in is busy; try again in a moment.');
  return reserved;
}

/** A correct password: successful sign-ins do not count. */
export async function forgiveAttempt(attempt: LoginAttempt): Promise<void> {
  await authRepository.deleteLoginFailure(attempt.id);
}

/** Old rows carry no weight in the count; prune them so the table stays small. */
export async function pruneLoginFailures(): Promise<void> {
  await authRepository.deleteLoginFailuresBefore(new Date(Date.now() - 24 * 3600_000));
}
