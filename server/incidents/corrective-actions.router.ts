import { Router } from 'express';
import { actionListQuerySchema, updateActionSchema } from '../../shared/schemas/corrective-actions';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { writeRoute } from '../core/record-routes';
import { validate, validated } from '../core/validate';
import { sendOverdueReminders } from '../mail/action-mail.service';
import { listActions } from './corrective-actions-list.service';
import { updateAction } from './corrective-actions.service';

export const correctiveActionsRouter = Router();

correctiveActionsRouter.get('/', requireUser, validate({ query: actionListQuerySchema }), async (req, res) => {
  res.json(await listActions(currentUser(req), validated(req, actionListQuerySchema)));
});

// The scheduler sends these by itself; a supervisor or admin may send the due ones now.
correctiveActionsRouter.post('/reminders', requireRole('supervisor', 'admin'), async (_req, res) => {
  res.json(await sendOverdueReminders());
});

correctiveActionsRouter.patch(
  '/:id',
  ...writeRoute(updateActionSchema, updateAction, { guard: requireRole('supervisor') }),
);
