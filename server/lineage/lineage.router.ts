import { Router } from 'express';
import { holdSchema } from '../../shared/schemas/jar-lineage';
import { requireRole } from '../core/auth-guards';
import { detailRoute, writeRoute } from '../core/record-routes';
import { cultureLineage, holdLineage, jarLineage } from './lineage.service';

export const lineageRouter = Router();
const reviewer = { guard: requireRole('supervisor', 'admin') };

lineageRouter.get('/culture/:id', ...detailRoute(cultureLineage));
lineageRouter.get('/jar/:id', ...detailRoute(jarLineage));
lineageRouter.post(
  '/culture/:id/hold',
  ...writeRoute(holdSchema, (actor, id, body) => holdLineage(actor, { kind: 'culture', id }, body.reason), reviewer),
);
lineageRouter.post(
  '/jar/:id/hold',
  ...writeRoute(holdSchema, (actor, id, body) => holdLineage(actor, { kind: 'jar', id }, body.reason), reviewer),
);
