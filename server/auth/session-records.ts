import type { EntityManager } from 'typeorm';
import { authRepository } from './auth.repository';

/** Signs a user out everywhere but `keepSessionId`; answers how many sessions ended. */
export const endOtherSessions = (m: EntityManager, userId: number, keepSessionId: string): Promise<number> =>
  authRepository.deleteOtherSessions(m, userId, keepSessionId);

/** The store's own sweep is replaced by ours, so that a database blip is logged, not fatal. */
export const deleteExpiredSessions = (): Promise<number> =>
  authRepository.deleteSessionsExpiredBefore(Math.floor(Date.now() / 1000));
