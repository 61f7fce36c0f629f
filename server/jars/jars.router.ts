import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  createJarBatchSchema,
  jarEventInputSchema,
  jarExportQuerySchema,
  jarListQuerySchema,
  labelParamsSchema,
  labelSheetQuerySchema,
  shelfQuerySchema,
  shelfWalkSchema,
  type JarListQuery,
  type ShelfQuery,
} from '../../shared/schemas/jars';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { sendCsv } from '../core/csv';
import { todayLocal } from '../core/local-time';
import { validate } from '../core/validate';
import { recordJarEvent } from './jar-events.service';
import { recordShelfWalk } from './shelf-walk.service';
import { jarQrSvg, labelSheet } from './jar-labels.service';
import { jarStory } from './jar-story.service';
import { createJarBatch, exportJars, listJars, shelfJars } from './jars.service';
import { jarCsvHeader, jarCsvRow } from './jars.mapper';

export const jarsRouter = Router();
const writer = requireRole('technician', 'supervisor', 'admin');

jarsRouter.get('/', requireUser, validate({ query: jarListQuerySchema }), async (req, res) => {
  res.json(await listJars(req.query as unknown as JarListQuery));
});

jarsRouter.get('/export.csv', requireUser, validate({ query: jarExportQuerySchema }), async (req, res) => {
  const rows = await exportJars(req.query);
  sendCsv(res, `jars-${todayLocal()}.csv`, jarCsvHeader, rows.map(jarCsvRow));
});

jarsRouter.post('/batch', writer, validate({ body: createJarBatchSchema }), async (req, res) => {
  res.status(201).json(await createJarBatch(currentUser(req), req.body));
});

jarsRouter.get('/shelf', requireUser, validate({ query: shelfQuerySchema }), async (req, res) => {
  res.json({ items: await shelfJars(req.query as unknown as ShelfQuery) });
});

jarsRouter.post('/shelf-walk', writer, validate({ body: shelfWalkSchema }), async (req, res) => {
  res.json(await recordShelfWalk(currentUser(req), req.body));
});

jarsRouter.get('/labels', requireUser, validate({ query: labelSheetQuerySchema }), async (req, res) => {
  res.json({ items: await labelSheet(req.query) });
});

jarsRouter.get('/by-label/:label', requireUser, validate({ params: labelParamsSchema }), async (req, res) => {
  res.json(await jarStory({ label: String(req.params.label) }));
});

jarsRouter.get('/:id', requireUser, validate({ params: idParamsSchema }), async (req, res) => {
  res.json(await jarStory({ id: Number(req.params.id) }));
});

jarsRouter.get('/:id/qr.svg', requireUser, validate({ params: idParamsSchema }), async (req, res) => {
  const svg = await jarQrSvg(Number(req.params.id));
  res.setHeader('Content-Type', 'image/svg+xml; charset=utf-8');
  res.setHeader('Cache-Control', 'private, max-age=86400');
  res.send(svg);
});

jarsRouter.post(
  '/:id/events',
  writer,
  validate({ params: idParamsSchema, body: jarEventInputSchema }),
  async (req, res) => {
    res.status(201).json(await recordJarEvent(currentUser(req), Number(req.params.id), req.body));
  },
);
