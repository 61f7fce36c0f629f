import { Router } from 'express';
import { dataSource } from '../db/data-source';

export const healthRouter = Router();

healthRouter.get('/', async (_req, res) => {
  try {
    await dataSource.query('SELECT 1');
    res.json({ status: 'ok', db: 'up' });
  } catch {
    res.status(503).json({ status: 'error', db: 'down' });
  }
});
