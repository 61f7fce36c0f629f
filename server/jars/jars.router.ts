import { Router } from 'express';
import { createJarBatchSchema, jarExportQuerySchema, jarListQuerySchema } from '../../shared/schemas/jars';
import { jarEventInputSchema } from '../../shared/schemas/jar-events';
import { labelParamsSchema, labelSheetQuerySchema } from '../../shared/schemas/jar-labels';
import { shelfQuerySchema, shelfWalkSchema, undoShelfMarkSchema } from '../../shared/schemas/jar-shelf';
import { currentUser, requireUser } from '../core/auth-guards';
import { todayLocal } from '../core/local-time';
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
import { validate, validated } from '../core/validate';
import { recordJarEvent } from './jar-events.service';
import { idempotentHandler } from '../idempotency/idempotent-route';
import { recordShelfWalk } from './shelf-walk.service';
import { undoShelfMark } from './shelf-mark-undo.service';
import { jarQrSvg, labelSheet } from './jar-labels.service';
import { jarStory } from './jar-story.service';
import { createJarBatch, exportJars, listJars, shelfJars, shelfPlaces } from './jars.service';
import { jarCsvHeader, jarCsvRow } from './jars.mapper';

export const jarsRouter = Router();

jarsRouter.get('/', ...listRoute(jarListQuerySchema, listJars));
jarsRouter.get(
  '/export.csv',
  ...csvExportRoute(jarExportQuerySchema, {
    rows: exportJars,
    filename: () => `jars-${todayLocal()}.csv`,
    header: jarCsvHeader,
    row: jarCsvRow,
  }),
);
jarsRouter.post('/batch', ...createRoute(createJarBatchSchema, createJarBatch));

jarsRouter.get('/shelf', requireUser, validate({ query: shelfQuerySchema }), async (req, res) => {
  res.json({ items: await shelfJars(validated(req, shelfQuerySchema)) });
});

jarsRouter.get('/shelves', requireUser, async (_req, res) => {
  res.json({ items: await shelfPlaces() });
});

jarsRouter.post(
  '/shelf-walk',
  requireWriter,
  validate({ body: shelfWalkSchema }),
  idempotentHandler('shelf-mark', 200, (req, claim) =>
    recordShelfWalk(currentUser(req), validated(req, shelfWalkSchema), claim),
  ),
);

jarsRouter.post('/shelf-walk/undo', requireWriter, validate({ body: undoShelfMarkSchema }), async (req, res) => {
  res.json(await undoShelfMark(currentUser(req), validated(req, undoShelfMarkSchema)));
});

jarsRouter.get('/labels', requireUser, validate({ query: labelSheetQuerySchema }), async (req, res) => {
  res.json({ items: await labelSheet(validated(req, labelSheetQuerySchema)) });
});

jarsRouter.get('/by-label/:label', requireUser, validate({ params: labelParamsSchema }), async (req, res) => {
  res.json(await jarStory(validated(req, labelParamsSchema)));
});

jarsRouter.get('/:id', ...detailRoute((id) => jarStory({ id })));

jarsRouter.get('/:id/qr.svg', requireUser, validId, async (req, res) => {
  const svg = await jarQrSvg(idParam(req));
  res.setHeader('Content-Type', 'image/svg+xml; charset=utf-8');
  res.setHeader('Cache-Control', 'private, max-age=86400');
  res.send(svg);
});

jarsRouter.post('/:id/events', ...writeRoute(jarEventInputSchema, recordJarEvent, { status: 201 }));
