import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  createGrainLotSchema,
  createGrainSchema,
  createPrepBatchSchema,
  grainLotListQuerySchema,
  prepBatchListQuerySchema,
  type GrainLotListQuery,
  type PrepBatchListQuery,
} from '../../shared/schemas/grain';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { validate } from '../core/validate';
import {
  createGrain,
  createGrainLot,
  createPrepBatch,
  getGrainLot,
  getPrepBatch,
  listGrainLots,
  listGrains,
  listPrepBatches,
} from './grain.service';

/** Trainers read the production record; only the floor roles write it (DESIGN.md §2). */
const writers = requireRole('technician', 'supervisor', 'admin');

export const grainsRouter = Router();
grainsRouter.get('/', requireUser, async (_req, res) => {
  res.json(await listGrains());
});
grainsRouter.post('/', requireRole('admin'), validate({ body: createGrainSchema }), async (req, res) => {
  res.status(201).json(await createGrain(currentUser(req), req.body));
});

export const grainLotsRouter = Router();
grainLotsRouter.get('/', requireUser, validate({ query: grainLotListQuerySchema }), async (req, res) => {
  res.json(await listGrainLots(req.query as unknown as GrainLotListQuery));
});
grainLotsRouter.get('/:id', requireUser, validate({ params: idParamsSchema }), async (req, res) => {
  res.json(await getGrainLot(Number(req.params.id)));
});
grainLotsRouter.post('/', writers, validate({ body: createGrainLotSchema }), async (req, res) => {
  res.status(201).json(await createGrainLot(currentUser(req), req.body));
});

export const prepBatchesRouter = Router();
prepBatchesRouter.get('/', requireUser, validate({ query: prepBatchListQuerySchema }), async (req, res) => {
  res.json(await listPrepBatches(req.query as unknown as PrepBatchListQuery));
});
prepBatchesRouter.get('/:id', requireUser, validate({ params: idParamsSchema }), async (req, res) => {
  res.json(await getPrepBatch(Number(req.params.id)));
});
prepBatchesRouter.post('/', writers, validate({ body: createPrepBatchSchema }), async (req, res) => {
  res.status(201).json(await createPrepBatch(currentUser(req), req.body));
});
