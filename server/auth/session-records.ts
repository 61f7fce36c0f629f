import type { EntityManager } from 'typeorm';
import { dataSource } from '../db/data-source';
import { SessionRecord } from './session-record.entity';

/** Signs a user out everywhere but `keepSessionId`; answers how many sessions ended. */
export async function endOtherSessions(m: EntityManager, userId: number, keepSessionId: string): Promise<number> {
  const result = await m
    .createQueryBuilder()
    .delete()
    .from(SessionRecord)
    // passport keeps the user id in the session's JSON as {"passport":{"user":<id>}}.
    .where("JSON_VALUE(data, '$.passport.user') = :user", { user: String(userId) })
    .andWhere('session_id <> :keep', { keep: keepSessionId })
    .execute();
  return result.affected ?? 0;
}

/** The store's own sweep is replaced by ours, so that a database blip is logged, not fatal. */
export async function deleteExpiredSessions(): Promise<number> {
  const result = await dataSource.manager
    .createQueryBuilder()
    .delete()
    .from(SessionRecord)
    .where('expires < :now', { now: Math.floor(Date.now() / 1000) })
    .execute();
  return result.affected ?? 0;
}
