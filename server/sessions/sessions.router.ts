import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  createSessionSchema,
  sessionListQuerySchema,
  updateSessionSchema,
  workspaceLabels,
  type SessionListQuery,
} from '../../shared/schemas/sessions';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { sendCsv } from '../core/csv';
import { validate } from '../core/validate';
import { createSession, exportSessions, getSession, listSessions, updateSession } from './sessions.service';

export const sessionsRouter = Router();
const writers = requireRole('technician', 'supervisor', 'admin');

sessionsRouter.get('/', requireUser, validate({ query: sessionListQuerySchema }), async (req, res) => {
  res.json(await listSessions(req.query as unknown as SessionListQuery));
});

sessionsRouter.get('/export.csv', requireUser, validate({ query: sessionListQuerySchema }), async (req, res) => {
  const rows = await exportSessions(req.query as unknown as SessionListQuery);
  sendCsv(
    res,
    'inoculation-sessions.csv',
    ['code', 'held_on', 'started_at', 'operator', 'workspace', 'procedure_version_id', 'notes'],
    rows.map((s) => [
      s.code,
      s.heldOn,
      s.startedAt,
      s.operatorName,
      s.workspace ? workspaceLabels[s.workspace] : null,
      s.procedureVersionId,
      s.notes,
    ]),
  );
});

sessionsRouter.get('/:id', requireUser, validate({ params: idParamsSchema }), async (req, res) => {
  res.json(await getSession(Number(req.params.id)));
});

sessionsRouter.post('/', writers, validate({ body: createSessionSchema }), async (req, res) => {
  res.status(201).json(await createSession(currentUser(req), req.body));
});

sessionsRouter.patch(
  '/:id',
  writers,
  validate({ params: idParamsSchema, body: updateSessionSchema }),
  async (req, res) => {
    res.json(await updateSession(currentUser(req), Number(req.params.id), req.body));
  },
);
