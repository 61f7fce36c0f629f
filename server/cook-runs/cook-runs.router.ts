import express, { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  cookRunListQuerySchema,
  createCookRunSchema,
  updateCookRunSchema,
  type CookRunListQuery,
} from '../../shared/schemas/cook-runs';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { sendCsv } from '../core/csv';
import { badRequest, unprocessable } from '../core/errors';
import { validate } from '../core/validate';
import {
  assertCookRunExists,
  createCookRun,
  exportCookRuns,
  getCookRun,
  getCookRunReadings,
  listCookRuns,
  removeCookRunReadings,
  replaceCookRunReadings,
  updateCookRun,
} from './cook-runs.service';
import { parseReadingsCsv } from './readings-csv';

export const cookRunsRouter = Router();
const writers = requireRole('technician', 'supervisor', 'admin');
const params = validate({ params: idParamsSchema });
const maxLogBytes = 5 * 1024 * 1024;
const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: maxLogBytes, files: 1 } });
const csvBody = express.text({ type: ['text/csv', 'text/plain', 'application/csv'], limit: maxLogBytes });

/** A log arrives either as the raw body (text/csv) or as the multipart field `file`. */
const readLog: RequestHandler = (req, res, next) => {
  if (req.is('multipart/form-data')) return upload.single('file')(req, res, next);
  return csvBody(req, res, next);
};

const shownIssues = 50;

cookRunsRouter.get('/', requireUser, validate({ query: cookRunListQuerySchema }), async (req, res) => {
  res.json(await listCookRuns(req.query as unknown as CookRunListQuery));
});

cookRunsRouter.get('/export.csv', requireUser, validate({ query: cookRunListQuerySchema }), async (req, res) => {
  const runs = await exportCookRuns(req.query as unknown as CookRunListQuery);
  sendCsv(
    res,
    'cook-runs.csv',
    [
      'code',
      'cooked_on',
      'started_at',
      'vessel',
      'container',
      'minutes_at_pressure',
      'gauge_kpa',
      'gauge_psi',
      'venting_minutes',
      'altitude_m',
      'load_count',
      'operator',
      'f0',
      'f0_source',
      'below_target',
      'notes',
    ],
    runs.map((r) => [
      r.code,
      r.cookedOn,
      r.startedAt,
      r.vessel,
      r.container,
      r.minutesAtPressure,
      r.gaugeKPa,
      r.gaugePsi === null ? null : r.gaugePsi.toFixed(2),
      r.ventingMinutes,
      r.altitudeM,
      r.loadCount,
      r.operatorName,
      r.f0 === null ? null : r.f0.toFixed(2),
      r.f0Label,
      r.lowLethality ? 'yes' : 'no',
      r.notes,
    ]),
  );
});

cookRunsRouter.get('/:id', requireUser, params, async (req, res) => {
  res.json(await getCookRun(Number(req.params.id)));
});

cookRunsRouter.post('/', writers, validate({ body: createCookRunSchema }), async (req, res) => {
  res.status(201).json(await createCookRun(currentUser(req), req.body));
});

cookRunsRouter.patch(
  '/:id',
  writers,
  validate({ params: idParamsSchema, body: updateCookRunSchema }),
  async (req, res) => {
    res.json(await updateCookRun(currentUser(req), Number(req.params.id), req.body));
  },
);

cookRunsRouter.get('/:id/readings', requireUser, params, async (req, res) => {
  res.json(await getCookRunReadings(Number(req.params.id)));
});

cookRunsRouter.post('/:id/readings', writers, params, readLog, async (req, res) => {
  const id = Number(req.params.id);
  await assertCookRunExists(id);
  const text = req.file ? req.file.buffer.toString('utf8') : typeof req.body === 'string' ? req.body : null;
  if (text === null) {
    throw badRequest('file: send the temperature log as text/csv or as the multipart field "file"', [
      { path: 'file', message: 'is missing: send a CSV of elapsed minutes and °C' },
    ]);
  }
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
  res.json(await replaceCookRunReadings(currentUser(req), id, samples));
});

cookRunsRouter.delete('/:id/readings', writers, params, async (req, res) => {
  res.json(await removeCookRunReadings(currentUser(req), Number(req.params.id)));
});
