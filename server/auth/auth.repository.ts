import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { LoginFailure } from './login-failure.entity';
import { SessionRecord } from './session-record.entity';

export interface LoginFailureCounts {
  byUser: string | null;
  usernamesByAddress: string | null;
  byAddress: string | null;
}

export const authRepository = {
  /** Failures since `since` by the username, by the address, and distinct usernames from the address. */
  loginFailureCounts: (m: EntityManager, username: string, address: string, since: Date) =>
    m
      .createQueryBuilder(LoginFailure, 'f')
      .select('SUM(f.username = :username)', 'byUser')
      .addSelect('COUNT(DISTINCT CASE WHEN f.address = :address THEN f.username END)', 'usernamesByAddress')
      .addSelect('SUM(f.address = :address)', 'byAddress')
      .where('f.failedAt >= :since', { since })
      .andWhere('(f.username = :username OR f.address = :address)', { username, address })
      .getRawOne<LoginFailureCounts>(),
  insertLoginFailure: (m: EntityManager, row: { username: string; address: string; failedAt: Date }) =>
    m.insert(LoginFailure, row),
  deleteLoginFailure: (id: string) => dataSource.manager.delete(LoginFailure, { id }),
  deleteLoginFailuresBefore: (before: Date) =>
    dataSource.manager
      .createQueryBuilder()
      .delete()
      .from(LoginFailure)
      .where('failedAt < :before', { before })
      .execute(),

  /** Deletes the user's sessions but `keepSessionId`; answers how many there were. */
  async deleteOtherSessions(m: EntityManager, userId: number, keepSessionId: string): Promise<number> {
    const result = await m
      .createQueryBuilder()
      .delete()
      .from(SessionRecord)
      // passport keeps the user id in the session's JSON as {"passport":{"user":<id>}}.
      .where("JSON_VALUE(data, '$.passport.user') = :user", { user: String(userId) })
      .andWhere('session_id <> :keep', { keep: keepSessionId })
      .execute();
    return result.affected ?? 0;
  },
  async deleteSessionsExpiredBefore(nowSeconds: number): Promise<number> {
    const result = await dataSource.manager
      .createQueryBuilder()
      .delete()
      .from(SessionRecord)
      .where('expires < :now', { now: nowSeconds })
      .execute();
    return result.affected ?? 0;
  },
};
