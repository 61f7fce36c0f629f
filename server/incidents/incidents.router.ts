import { Router } from 'express';
import { idParamsSchema } from '../../shared/schemas/common';
import {
  addIncidentPhotosSchema,
  createActionSchema,
  createIncidentSchema,
  incidentListQuerySchema,
  reviewIncidentSchema,
  updateIncidentSchema,
  voidIncidentSchema,
  type IncidentListQuery,
} from '../../shared/schemas/incidents';
import { currentUser, requireRole, requireUser } from '../core/auth-guards';
import { sendCsv } from '../core/csv';
import { todayLocal } from '../core/local-time';
import { validate } from '../core/validate';
import { createAction } from './corrective-actions.service';
import { exportIncidents } from './incidents-export';
import { reviewIncident, voidIncident } from './incident-review.service';
import { addIncidentPhotos, createIncident, getIncident, listIncidents, updateIncident } from './incidents.service';

export const incidentsRouter = Router();
const writers = requireRole('technician', 'supervisor', 'admin');
// DESIGN.md §2: only a supervisor sets an incident's status and verdict.
const supervisor = requireRole('supervisor');
const byId = { params: idParamsSchema };
const id = (req: { params: Record<string, string | string[]> }) => Number(req.params.id);

incidentsRouter.get('/', requireUser, validate({ query: incidentListQuerySchema }), async (req, res) => {
  res.json(await listIncidents(req.query as unknown as IncidentListQuery));
});

incidentsRouter.get('/export.csv', requireUser, validate({ query: incidentListQuerySchema }), async (req, res) => {
  const { header, rows } = await exportIncidents(req.query as unknown as IncidentListQuery);
  sendCsv(res, `incidents-${todayLocal()}.csv`, header, rows);
});

incidentsRouter.get('/:id', requireUser, validate(byId), async (req, res) => {
  res.json(await getIncident(id(req)));
});

incidentsRouter.post('/', writers, validate({ body: createIncidentSchema }), async (req, res) => {
  res.status(201).json(await createIncident(currentUser(req), req.body));
});

incidentsRouter.patch('/:id', writers, validate({ ...byId, body: updateIncidentSchema }), async (req, res) => {
  res.json(await updateIncident(currentUser(req), id(req), req.body));
});

incidentsRouter.post('/:id/review', supervisor, validate({ ...byId, body: reviewIncidentSchema }), async (req, res) => {
  res.json(await reviewIncident(currentUser(req), id(req), req.body));
});

incidentsRouter.post('/:id/void', supervisor, validate({ ...byId, body: voidIncidentSchema }), async (req, res) => {
  res.json(await voidIncident(currentUser(req), id(req), req.body));
});

incidentsRouter.post('/:id/photos', writers, validate({ ...byId, body: addIncidentPhotosSchema }), async (req, res) => {
  res.json(await addIncidentPhotos(currentUser(req), id(req), req.body));
});

incidentsRouter.post('/:id/actions', supervisor, validate({ ...byId, body: createActionSchema }), async (req, res) => {
  res.status(201).json(await createAction(currentUser(req), id(req), req.body));
});
