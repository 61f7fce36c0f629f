import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  changeCultureStateSchema,
  createAgarTestSchema,
  createCultureSchema,
  cultureListQuerySchema,
  updateCultureSchema,
  type CultureListQuery,
} from '../../shared/schemas/cultures';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { sendCsv } from '../core/csv';
import { validate } from '../core/validate';
import {
  addAgarTest,
  changeCultureState,
  createCulture,
  exportCultures,
  getCulture,
  listCultures,
  updateCulture,
} from './cultures.service';

export const culturesRouter = Router();
const writers = requireRole('technician', 'supervisor', 'admin');
const params = validate({ params: idParamsSchema });

culturesRouter.get('/', requireUser, validate({ query: cultureListQuerySchema }), async (req, res) => {
  res.json(await listCultures(req.query as unknown as CultureListQuery));
});

culturesRouter.get('/export.csv', requireUser, validate({ query: cultureListQuerySchema }), async (req, res) => {
  const rows = await exportCultures(req.query as unknown as CultureListQuery);
  sendCsv(
    res,
    'cultures.csv',
    ['code', 'species', 'strain', 'prepared_on', 'generation', 'volume_ml', 'parent', 'state', 'notes'],
    rows.map((c) => [
      c.code,
      c.species,
      c.strain,
      c.preparedOn,
      c.generation,
      c.volumeMl,
      c.parentCode,
      c.state,
      c.notes,
    ]),
  );
});

culturesRouter.get('/:id', requireUser, params, async (req, res) => {
  res.json(await getCulture(Number(req.params.id)));
});

culturesRouter.post('/', writers, validate({ body: createCultureSchema }), async (req, res) => {
  res.status(201).json(await createCulture(currentUser(req), req.body));
});

culturesRouter.patch(
  '/:id',
  writers,
  validate({ params: idParamsSchema, body: updateCultureSchema }),
  async (req, res) => {
    res.json(await updateCulture(currentUser(req), Number(req.params.id), req.body));
  },
);

// Releasing a culture for use is a quality decision, so the floor technician cannot make it.
culturesRouter.post(
  '/:id/state',
  requireRole('supervisor', 'admin'),
  validate({ params: idParamsSchema, body: changeCultureStateSchema }),
  async (req, res) => {
    res.json(await changeCultureState(currentUser(req), Number(req.params.id), req.body));
  },
);

culturesRouter.post(
  '/:id/agar-tests',
  writers,
  validate({ params: idParamsSchema, body: createAgarTestSchema }),
  async (req, res) => {
    res.status(201).json(await addAgarTest(currentUser(req), Number(req.params.id), req.body));
  },
);
