import { Router } from 'express';
import { dataSource } from '../db/data-source';

export const healthRouter = Router();

const answerWithinMs = 2000;

/** 503 while MariaDB is away (or too slow to answer), 200 again once it is back: no restart needed. */
healthRouter.get('/', async (_req, res) => {
  let timer: NodeJS.Timeout | undefined;
  const late = new Promise<never>((_resolve, reject) => {
    timer = setTimeout(() => reject(new Error('database did not answer in time')), answerWithinMs);
  });
  try {
    await Promise.race([dataSource.query('SELECT 1'), late]);
    res.json({ status: 'ok', db: 'up' });
  } catch {
    res.status(503).json({ status: 'error', db: 'down' });
  } finally {
    clearTimeout(timer);
  }
});
