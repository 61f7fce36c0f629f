import express, { Router, type RequestHandler } from 'express';
import { cookRunListQuerySchema, createCookRunSchema, updateCookRunSchema } from '../../shared/schemas/cook-runs';
import { currentUser } from '../core/auth-guards';
import { receiveUpload, uploadedBytes } from '../core/uploads';
import {
  createRoute,
  csvExportRoute,
  detailRoute,
  idParam,
  listRoute,
  requireWriter,
  validId,
  writeRoute,
} from '../core/record-routes';
import {
  createCookRun,
  exportCookRuns,
  getCookRun,
  listCookRuns,
  suggestCookRunCode,
  updateCookRun,
} from './cook-runs.service';
import { getCookRunReadings, removeCookRunReadings } from './cook-run-readings.service';
import { cookRunCsv } from './cook-runs.mapper';
import { uploadCookRunLog } from './cook-run-log.service';

export const cookRunsRouter = Router();
const maxLogBytes = 5 * 1024 * 1024;
const upload = receiveUpload({ field: 'file', maxBytes: maxLogBytes });
const csvBody = express.text({ type: ['text/csv', 'text/plain', 'application/csv'], limit: maxLogBytes });

/** A log arrives either as the raw body (text/csv) or as the multipart field `file`. */
const readLog: RequestHandler = (req, res, next) => {
  if (req.is('multipart/form-data')) return upload(req, res, next);
  return csvBody(req, res, next);
};

cookRunsRouter.get('/', ...listRoute(cookRunListQuerySchema, listCookRuns));
cookRunsRouter.get('/export.csv', ...csvExportRoute(cookRunListQuerySchema, { rows: exportCookRuns, ...cookRunCsv }));
cookRunsRouter.get('/next-code', requireWriter, async (_req, res) => {
  res.json({ code: await suggestCookRunCode() });
});
cookRunsRouter.get('/:id', ...detailRoute(getCookRun));
cookRunsRouter.post('/', ...createRoute(createCookRunSchema, createCookRun));
cookRunsRouter.patch('/:id', ...writeRoute(updateCookRunSchema, updateCookRun));

cookRunsRouter.get('/:id/readings', ...detailRoute(getCookRunReadings));

cookRunsRouter.post('/:id/readings', requireWriter, validId, readLog, async (req, res) => {
  const text = uploadedBytes(req)?.toString('utf8') ?? null;
  // The placement travels in the query (raw CSV body) or beside the file (multipart).
  const placement: unknown = { ...req.query, ...(req.file ? (req.body as object) : {}) };
  res.json(await uploadCookRunLog(currentUser(req), idParam(req), { text, placement }));
});

cookRunsRouter.delete('/:id/readings', requireWriter, validId, async (req, res) => {
  res.json(await removeCookRunReadings(currentUser(req), idParam(req)));
});
