import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import { holdSchema, type HoldInput } from '../../shared/schemas/jars';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { validate } from '../core/validate';
import { cultureLineage, holdLineage, jarLineage } from './lineage.service';

export const lineageRouter = Router();
const reviewer = requireRole('supervisor', 'admin');

lineageRouter.get('/culture/:id', requireUser, validate({ params: idParamsSchema }), async (req, res) => {
  res.json(await cultureLineage(Number(req.params.id)));
});

lineageRouter.get('/jar/:id', requireUser, validate({ params: idParamsSchema }), async (req, res) => {
  res.json(await jarLineage(Number(req.params.id)));
});

lineageRouter.post(
  '/culture/:id/hold',
  reviewer,
  validate({ params: idParamsSchema, body: holdSchema }),
  async (req, res) => {
    res.json(
      await holdLineage(
        currentUser(req),
        { kind: 'culture', id: Number(req.params.id) },
        (req.body as HoldInput).reason,
      ),
    );
  },
);

lineageRouter.post(
  '/jar/:id/hold',
  reviewer,
  validate({ params: idParamsSchema, body: holdSchema }),
  async (req, res) => {
    res.json(
      await holdLineage(currentUser(req), { kind: 'jar', id: Number(req.params.id) }, (req.body as HoldInput).reason),
    );
  },
);
