import { Router } from 'express';
import { currentUser, requireRole } from '../core/auth-guards';
import { idParam, validId } from '../core/record-routes';
import { markClusterAlertSeen } from '../mail/cluster-alerts.service';
import { supervisorQueue } from './queue.service';

export const queueRouter = Router();
const supervisor = requireRole('supervisor');

queueRouter.get('/', supervisor, async (req, res) => {
  res.json(await supervisorQueue(currentUser(req)));
});

queueRouter.post('/cluster-alerts/:id/seen', supervisor, validId, async (req, res) => {
  await markClusterAlertSeen(currentUser(req), idParam(req));
  res.status(204).end();
});
