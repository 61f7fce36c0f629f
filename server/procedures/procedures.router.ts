import { Router } from 'express';
import { idParamsSchema, pageQuerySchema } from '../../shared/schemas/common';
import {
  createProcedureSchema,
  publishVersionSchema,
  stepLinkInputSchema,
  stepStatsQuerySchema,
} from '../../shared/schemas/procedures';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { createRoute, detailRoute, idParam, listRoute, validId, writeRoute } from '../core/record-routes';
import { validate, validated } from '../core/validate';
import {
  createProcedure,
  getProcedure,
  getProcedureVersion,
  listProcedures,
  publishVersion,
} from './procedures.service';
import { linkStep, listLinksOfStep, listStepLinks, unlinkStep } from './step-links.service';
import { stepStats } from './step-stats.service';

/** Mounted at /api: procedures, their versions and steps, and incident–step links. */
export const proceduresRouter = Router();
const editors = requireRole('trainer', 'admin');

proceduresRouter.get('/procedures', ...listRoute(pageQuerySchema, listProcedures));
proceduresRouter.get('/procedures/:id', ...detailRoute(getProcedure));
proceduresRouter.post('/procedures', ...createRoute(createProcedureSchema, createProcedure, editors));
proceduresRouter.post(
  '/procedures/:id/versions',
  ...writeRoute(publishVersionSchema, publishVersion, { guard: editors, status: 201 }),
);
proceduresRouter.get('/procedure-versions/:id', ...detailRoute(getProcedureVersion));

proceduresRouter.get(
  '/procedure-steps/:id/stats',
  requireUser,
  validate({ params: idParamsSchema, query: stepStatsQuerySchema }),
  async (req, res) => {
    res.json(await stepStats(idParam(req), validated(req, stepStatsQuerySchema)));
  },
);

proceduresRouter.get(
  '/procedure-steps/:id/links',
  ...detailRoute(async (id) => ({ items: await listLinksOfStep(id) })),
);
proceduresRouter.get('/incidents/:id/step-links', ...detailRoute(async (id) => ({ items: await listStepLinks(id) })));
proceduresRouter.post(
  '/incidents/:id/step-links',
  ...writeRoute(stepLinkInputSchema, linkStep, { guard: editors, status: 201 }),
);

proceduresRouter.delete('/step-links/:id', editors, validId, async (req, res) => {
  await unlinkStep(currentUser(req), idParam(req));
  res.status(204).end();
});
