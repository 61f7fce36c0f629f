import { Router } from 'express';
import { updateActionSchema } from '../../shared/schemas/incidents';
import { requireRole } from '../core/auth-guards';
import { writeRoute } from '../core/record-routes';
import { updateAction } from './corrective-actions.service';

export const correctiveActionsRouter = Router();

correctiveActionsRouter.patch(
  '/:id',
  ...writeRoute(updateActionSchema, updateAction, { guard: requireRole('supervisor') }),
);
