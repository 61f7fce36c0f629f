import { Router } from 'express';
import { idParamsSchema, pageQuerySchema, type PageQuery } from '../../shared/schemas/common';
import {
  createProcedureSchema,
  publishVersionSchema,
  stepLinkInputSchema,
  stepStatsQuerySchema,
} from '../../shared/schemas/procedures';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { validate } from '../core/validate';
import { createProcedure, getProcedure, getProcedureVersion, listProcedures, publishVersion } from './procedures.service';
import { linkStep, listStepLinks, unlinkStep } from './step-links.service';
import { stepStats } from './step-stats.service';

/** Mounted at /api: procedures, their versions and steps, and incident–step links. */
export const proceduresRouter = Router();
const editors = requireRole('trainer', 'admin');
const byId = validate({ params: idParamsSchema });

proceduresRouter.get('/procedures', requireUser, validate({ query: pageQuerySchema }), async (req, res) => {
  res.json(await listProcedures(req.query as unknown as PageQuery));
});

proceduresRouter.get('/procedures/:id', requireUser, byId, async (req, res) => {
  res.json(await getProcedure(Number(req.params.id)));
});

proceduresRouter.post('/procedures', editors, validate({ body: createProcedureSchema }), async (req, res) => {
  res.status(201).json(await createProcedure(currentUser(req), req.body));
});

proceduresRouter.post('/procedures/:id/versions', editors, validate({ params: idParamsSchema, body: publishVersionSchema }), async (req, res) => {
  res.status(201).json(await publishVersion(currentUser(req), Number(req.params.id), req.body));
});

proceduresRouter.get('/procedure-versions/:id', requireUser, byId, async (req, res) => {
  res.json(await getProcedureVersion(Number(req.params.id)));
});

proceduresRouter.get('/procedure-steps/:id/stats', requireUser, validate({ params: idParamsSchema, query: stepStatsQuerySchema }), async (req, res) => {
  res.json(await stepStats(Number(req.params.id), req.query));
});

proceduresRouter.get('/incidents/:id/step-links', requireUser, byId, async (req, res) => {
  res.json({ items: await listStepLinks(Number(req.params.id)) });
});

proceduresRouter.post('/incidents/:id/step-links', editors, validate({ params: idParamsSchema, body: stepLinkInputSchema }), async (req, res) => {
  res.status(201).json(await linkStep(currentUser(req), Number(req.params.id), req.body));
});

proceduresRouter.delete('/step-links/:id', editors, byId, async (req, res) => {
  await unlinkStep(currentUser(req), Number(req.params.id));
  res.status(204).end();
});
