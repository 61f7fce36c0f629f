import { Router } from 'express';
import {
  createRetrainRequestSchema,
  createTrainingRecordSchema,
  operatorsQuerySchema,
  retrainRequestListQuerySchema,
  trainingRecordListQuerySchema,
  type RetrainRequestListQuery,
  type TrainingRecordListQuery,
} from '../../shared/schemas/training';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { createRoute, listRoute } from '../core/record-routes';
import { validate } from '../core/validate';
import { listOperators } from './operators.service';
import {
  createRetrainRequest,
  createTrainingRecord,
  listRetrainRequests,
  listTrainingRecords,
} from './training.service';

/** Mounted at /api: training records, the operators view and retraining requests. */
export const trainingRouter = Router();

// A technician sees only their own records and requests; the other roles see everyone's.
const ownUnlessStaff = (req: Express.Request, userId: number | undefined) =>
  currentUser(req).role === 'technician' ? currentUser(req).id : userId;

trainingRouter.get(
  '/training-records',
  requireUser,
  validate({ query: trainingRecordListQuerySchema }),
  async (req, res) => {
    const q = req.query as unknown as TrainingRecordListQuery;
    res.json(await listTrainingRecords({ ...q, userId: ownUnlessStaff(req, q.userId) }));
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
    const q = req.query as unknown as RetrainRequestListQuery;
    res.json(await listRetrainRequests({ ...q, userId: ownUnlessStaff(req, q.userId) }));
  },
);

trainingRouter.post(
  '/training/retrain-requests',
  ...createRoute(createRetrainRequestSchema, createRetrainRequest, requireRole('trainer', 'supervisor', 'admin')),
);
