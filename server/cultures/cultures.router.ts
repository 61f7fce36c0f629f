import { Router } from 'express';
import {
  changeCultureStateSchema,
  createAgarTestSchema,
  createCultureSchema,
  cultureListQuerySchema,
  updateCultureSchema,
} from '../../shared/schemas/cultures';
import { requireRole } from '../core/auth-guards';
import { createRoute, csvExportRoute, detailRoute, listRoute, writeRoute } from '../core/record-routes';
import {
  addAgarTest,
  changeCultureState,
  createCulture,
  exportCultures,
  getCulture,
  listCultures,
  updateCulture,
} from './cultures.service';
import { cultureCsv } from './cultures.mapper';

export const culturesRouter = Router();

culturesRouter.get('/', ...listRoute(cultureListQuerySchema, listCultures));
culturesRouter.get('/export.csv', ...csvExportRoute(cultureListQuerySchema, { rows: exportCultures, ...cultureCsv }));
culturesRouter.get('/:id', ...detailRoute(getCulture));
culturesRouter.post('/', ...createRoute(createCultureSchema, createCulture));
culturesRouter.patch('/:id', ...writeRoute(updateCultureSchema, updateCulture));
// Releasing a culture for use is a quality decision, so the floor technician cannot make it.
culturesRouter.post(
  '/:id/state',
  ...writeRoute(changeCultureStateSchema, changeCultureState, { guard: requireRole('supervisor', 'admin') }),
);
culturesRouter.post('/:id/agar-tests', ...writeRoute(createAgarTestSchema, addAgarTest, { status: 201 }));
