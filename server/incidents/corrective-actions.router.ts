import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import { updateActionSchema } from '../../shared/schemas/incidents';
import { currentUser, requireRole } from '../core/auth-guards';
import { validate } from '../core/validate';
import { updateAction } from './corrective-actions.service';

export const correctiveActionsRouter = Router();

correctiveActionsRouter.patch('/:id', requireRole('supervisor'), validate({ params: idParamsSchema, body: updateActionSchema }), async (req, res) => {
  res.json(await updateAction(currentUser(req), Number(req.params.id), req.body));
});
