import { dataSource } from '../db/data-source';
import type { EntityManager } from 'typeorm';

/**
 * Runs `work` holding a MariaDB named lock, so that several app instances (or concurrent requests)
 * never do it at once. GET_LOCK belongs to one connection, hence a dedicated query runner.
 * Answers undefined when the lock was not obtained within `waitSeconds`.
 */
export async function withNamedLock<T>(
  name: string,
  waitSeconds: number,
  work: (m: EntityManager) => Promise<T>,
): Promise<T | undefined> {
  const runner = dataSource.createQueryRunner();
  await runner.connect();
  try {
    const rows = (await runner.query('SELECT GET_LOCK(?, ?) AS got', [name, waitSeconds])) as {
      got: number | string | null;
    }[];
    if (Number(rows[0]?.got) !== 1) return undefined;
    try {
      return await work(runner.manager);
    } finally {
      await runner.query('SELECT RELEASE_LOCK(?)', [name]);
    }
  } finally {
    await runner.release();
  }
}
