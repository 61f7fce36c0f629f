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
import { validate } from '../core/validate';
import { listOperators } from './operators.service';
import { createRetrainRequest, createTrainingRecord, listRetrainRequests, listTrainingRecords } from './training.service';

/** Mounted at /api: training records, the operators view and retraining requests. */
export const trainingRouter = Router();

// A technician sees only their own records and requests; the other roles see everyone's.
const ownUnlessStaff = (req: Express.Request, userId: number | undefined) =>
  currentUser(req).role === 'technician' ? currentUser(req).id : userId;

trainingRouter.get('/training-records', requireUser, validate({ query: trainingRecordListQuerySchema }), async (req, res) => {
  const q = req.query as unknown as TrainingRecordListQuery;
  res.json(await listTrainingRecords({ ...q, userId: ownUnlessStaff(req, q.userId) }));
});

trainingRouter.post('/training-records', requireRole('trainer', 'admin'), validate({ body: createTrainingRecordSchema }), async (req, res) => {
  res.status(201).json(await createTrainingRecord(currentUser(req), req.body));
});

trainingRouter.get('/training/operators', requireRole('supervisor', 'trainer', 'admin'), validate({ query: operatorsQuerySchema }), async (req, res) => {
  res.json(await listOperators(req.query));
});

trainingRouter.get('/training/retrain-requests', requireUser, validate({ query: retrainRequestListQuerySchema }), async (req, res) => {
  const q = req.query as unknown as RetrainRequestListQuery;
  res.json(await listRetrainRequests({ ...q, userId: ownUnlessStaff(req, q.userId) }));
});

trainingRouter.post(
  '/training/retrain-requests',
  requireRole('trainer', 'supervisor', 'admin'),
  validate({ body: createRetrainRequestSchema }),
  async (req, res) => {
    res.status(201).json(await createRetrainRequest(currentUser(req), req.body));
  },
);
