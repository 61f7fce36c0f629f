import express, { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { receiveUpload } from '../core/uploads';
import {
  cookRunListQuerySchema,
  createCookRunSchema,
  readingsUploadQuerySchema,
  updateCookRunSchema,
} from '../../shared/schemas/cook-runs';
import { currentUser } from '../core/auth-guards';
import { badRequest, unprocessable } from '../core/errors';
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
  assertCookRunExists,
  createCookRun,
  exportCookRuns,
  getCookRun,
  getCookRunReadings,
  listCookRuns,
  removeCookRunReadings,
  replaceCookRunReadings,
  suggestCookRunCode,
  updateCookRun,
} from './cook-runs.service';
import { cookRunCsv } from './cook-runs.mapper';
import { parseReadingsCsv } from './readings-csv';

export const cookRunsRouter = Router();
const maxLogBytes = 5 * 1024 * 1024;
const upload = receiveUpload(
  multer({ storage: multer.memoryStorage(), limits: { fileSize: maxLogBytes, files: 1 } }).single('file'),
  'file',
);
const csvBody = express.text({ type: ['text/csv', 'text/plain', 'application/csv'], limit: maxLogBytes });

/** A log arrives either as the raw body (text/csv) or as the multipart field `file`. */
const readLog: RequestHandler = (req, res, next) => {
  if (req.is('multipart/form-data')) return upload(req, res, next);
  return csvBody(req, res, next);
};

const shownIssues = 50;

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
  const id = idParam(req);
  await assertCookRunExists(id);
  const text = req.file ? req.file.buffer.toString('utf8') : typeof req.body === 'string' ? req.body : null;
  if (text === null) {
    throw badRequest('file: send the temperature log as text/csv or as the multipart field "file"', [
      { path: 'file', message: 'is missing: send a CSV of elapsed minutes and °C' },
    ]);
  }
  // The placement travels in the query (raw CSV body) or beside the file (multipart).
  const { placement } = readingsUploadQuerySchema.parse({ ...req.query, ...(req.file ? req.body : {}) });
  const { samples, errors } = parseReadingsCsv(text);
  if (errors.length) {
    const issues = errors.slice(0, shownIssues).map((e) => ({
      path: 'file',
      message: `line ${e.line}${e.column ? `, ${e.column}` : ''}: ${e.message}`,
    }));
    if (errors.length > shownIssues)
      issues.push({ path: 'file', message: `and ${errors.length - shownIssues} more errors` });
    throw unprocessable(
      `The temperature log has ${errors.length} error${errors.length === 1 ? '' : 's'}; nothing was stored.`,
      issues,
    );
  }
  res.json(await replaceCookRunReadings(currentUser(req), id, samples, placement));
});

cookRunsRouter.delete('/:id/readings', requireWriter, validId, async (req, res) => {
  res.json(await removeCookRunReadings(currentUser(req), idParam(req)));
});
