import { Router } from 'express';
import {
  addIncidentPhotosSchema,
  createIncidentSchema,
  incidentListQuerySchema,
  reviewIncidentSchema,
  updateIncidentSchema,
  voidIncidentSchema,
} from '../../shared/schemas/incidents';
import { createActionSchema } from '../../shared/schemas/corrective-actions';
import { currentUser, requireRole } from '../core/auth-guards';
import { csvExportRoute, detailRoute, idParam, listRoute, requireWriter, writeRoute } from '../core/record-routes';
import { validate, validated } from '../core/validate';
import { idempotentHandler } from '../idempotency/idempotent-route';
import { idParamsSchema } from '../../shared/schemas/common';
import { createAction } from './corrective-actions.service';
import { incidentCsv } from './incidents-export';
import { reviewIncident, voidIncident } from './incident-review.service';
import { addIncidentPhotos, createIncident, getIncident, listIncidents, updateIncident } from './incidents.service';

export const incidentsRouter = Router();
// DESIGN.md §2: only a supervisor sets an incident's status and verdict.
const supervisor = { guard: requireRole('supervisor') };

incidentsRouter.get('/', ...listRoute(incidentListQuerySchema, listIncidents));
incidentsRouter.get('/export.csv', ...csvExportRoute(incidentListQuerySchema, incidentCsv));
incidentsRouter.get('/:id', ...detailRoute(getIncident));
incidentsRouter.post(
  '/',
  requireWriter,
  validate({ body: createIncidentSchema }),
  idempotentHandler('incident', 201, (req, claim) =>
    createIncident(currentUser(req), validated(req, createIncidentSchema), claim),
  ),
);
incidentsRouter.patch('/:id', ...writeRoute(updateIncidentSchema, updateIncident));
incidentsRouter.post('/:id/review', ...writeRoute(reviewIncidentSchema, reviewIncident, supervisor));
incidentsRouter.post('/:id/void', ...writeRoute(voidIncidentSchema, voidIncident, supervisor));
incidentsRouter.post(
  '/:id/photos',
  requireWriter,
  validate({ params: idParamsSchema, body: addIncidentPhotosSchema }),
  idempotentHandler('incident-photos', 200, (req, claim) =>
    addIncidentPhotos(currentUser(req), idParam(req), validated(req, addIncidentPhotosSchema), claim),
  ),
);
incidentsRouter.post('/:id/actions', ...writeRoute(createActionSchema, createAction, { ...supervisor, status: 201 }));
