import { Router } from 'express';
import {
  createGrainLotSchema,
  createGrainSchema,
  createPrepBatchSchema,
  grainLotListQuerySchema,
  prepBatchListQuerySchema,
} from '../../shared/schemas/grain';
import { requireRole, requireUser } from '../core/auth-guards';
import { createRoute, detailRoute, listRoute } from '../core/record-routes';
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

export const grainsRouter = Router();
grainsRouter.get('/', requireUser, async (_req, res) => {
  res.json(await listGrains());
});
grainsRouter.post('/', ...createRoute(createGrainSchema, createGrain, requireRole('admin')));

export const grainLotsRouter = Router();
grainLotsRouter.get('/', ...listRoute(grainLotListQuerySchema, listGrainLots));
grainLotsRouter.get('/:id', ...detailRoute(getGrainLot));
grainLotsRouter.post('/', ...createRoute(createGrainLotSchema, createGrainLot));

export const prepBatchesRouter = Router();
prepBatchesRouter.get('/', ...listRoute(prepBatchListQuerySchema, listPrepBatches));
prepBatchesRouter.get('/:id', ...detailRoute(getPrepBatch));
prepBatchesRouter.post('/', ...createRoute(createPrepBatchSchema, createPrepBatch));
