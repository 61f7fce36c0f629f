import { Router } from 'express';
import {
  createRetrainRequestSchema,
  createTrainingRecordSchema,
  operatorsQuerySchema,
  retrainRequestListQuerySchema,
  trainingRecordListQuerySchema,
} from '../../shared/schemas/training';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { createRoute, listRoute } from '../core/record-routes';
import { validate, validated } from '../core/validate';
import { listOperators } from './operators.service';
import {
  createRetrainRequest,
  createTrainingRecord,
  listRetrainRequests,
  listTrainingRecords,
} from './training.service';

/** Mounted at /api: training records, the operators view and retraining requests. */
export const trainingRouter = Router();

trainingRouter.get(
  '/training-records',
  requireUser,
  validate({ query: trainingRecordListQuerySchema }),
  async (req, res) => {
    res.json(await listTrainingRecords(currentUser(req), validated(req, trainingRecordListQuerySchema)));
  },
);

trainingRouter.post(
  '/training-records',
  ...createRoute(createTrainingRecordSchema, createTrainingRecord, requireRole('trainer', 'admin')),
);

trainingRouter.get(
  '/training/operators',
  ...listRoute(operatorsQuerySchema, listOperators, requireRole('supervisor', 'trainer', 'admin')),
);

trainingRouter.get(
  '/training/retrain-requests',
  requireUser,
  validate({ query: retrainRequestListQuerySchema }),
  async (req, res) => {
    res.json(await listRetrainRequests(currentUser(req), validated(req, retrainRequestListQuerySchema)));
  },
);

trainingRouter.post(
  '/training/retrain-requests',
  ...createRoute(createRetrainRequestSchema, createRetrainRequest, requireRole('trainer', 'supervisor', 'admin')),
);
