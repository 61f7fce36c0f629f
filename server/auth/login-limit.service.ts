import { config } from '../core/config';
import { dataSource } from '../db/data-source';
import { LoginFailure } from './login-failure.entity';

const windowStart = () => new Date(Date.now() - config().LOGIN_WINDOW_MINUTES * 60_000);

/**
 * Blocked when one username has reached the limit, or when one address has failed on as many
 * different usernames (a spray). Counting distinct usernames per address keeps a colleague on the
 * same lab network able to sign in while someone else's account is locked.
 */
export async function isLoginBlocked(username: string, address: string): Promise<boolean> {
  const limit = config().LOGIN_FAILURE_LIMIT;
  const since = windowStart();
  const row = await dataSource.manager
    .createQueryBuilder(LoginFailure, 'f')
    .select('SUM(f.username = :username)', 'byUser')
    .addSelect('COUNT(DISTINCT CASE WHEN f.address = :address THEN f.username END)', 'byAddress')
    .where('f.failedAt >= :since', { since })
    .andWhere('(f.username = :username OR f.address = :address)', { username, address })
    .getRawOne<{ byUser: string | null; byAddress: string | null }>();
  return Number(row?.byUser ?? 0) >= limit || Number(row?.byAddress ?? 0) >= limit;
}

export async function recordLoginFailure(username: string, address: string): Promise<void> {
  await dataSource.manager.insert(LoginFailure, {
    username: username.slice(0, 64),
    address: address.slice(0, 64),
    failedAt: new Date(),
  });
}

/** Old rows carry no weight in the count; prune them so the table stays small. */
export async function pruneLoginFailures(): Promise<void> {
  await dataSource.manager
    .createQueryBuilder()
    .delete()
    .from(LoginFailure)
    .where('failedAt < :before', { before: new Date(Date.now() - 24 * 3600_000) })
    .execute();
}
