import { Router } from 'express';
import { createSessionSchema, sessionListQuerySchema, updateSessionSchema } from '../../shared/schemas/sessions';
import { createRoute, csvExportRoute, detailRoute, listRoute, requireWriter, writeRoute } from '../core/record-routes';
import {
  createSession,
  exportSessions,
  getSession,
  listSessions,
  suggestSessionCode,
  updateSession,
} from './sessions.service';
import { sessionCsv } from './sessions.mapper';

export const sessionsRouter = Router();

sessionsRouter.get('/', ...listRoute(sessionListQuerySchema, listSessions));
sessionsRouter.get('/export.csv', ...csvExportRoute(sessionListQuerySchema, { rows: exportSessions, ...sessionCsv }));
sessionsRouter.get('/next-code', requireWriter, async (_req, res) => {
  res.json({ code: await suggestSessionCode() });
});
sessionsRouter.get('/:id', ...detailRoute(getSession));
sessionsRouter.post('/', ...createRoute(createSessionSchema, createSession));
sessionsRouter.patch('/:id', ...writeRoute(updateSessionSchema, updateSession));
