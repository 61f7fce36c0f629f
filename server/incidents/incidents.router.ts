import { Router } from 'express';
import {
  addIncidentPhotosSchema,
  createActionSchema,
  createIncidentSchema,
  incidentListQuerySchema,
  reviewIncidentSchema,
  updateIncidentSchema,
  voidIncidentSchema,
} from '../../shared/schemas/incidents';
import { requireRole } from '../core/auth-guards';
import { createRoute, csvExportRoute, detailRoute, listRoute, writeRoute } from '../core/record-routes';
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
incidentsRouter.post('/', ...createRoute(createIncidentSchema, createIncident));
incidentsRouter.patch('/:id', ...writeRoute(updateIncidentSchema, updateIncident));
incidentsRouter.post('/:id/review', ...writeRoute(reviewIncidentSchema, reviewIncident, supervisor));
incidentsRouter.post('/:id/void', ...writeRoute(voidIncidentSchema, voidIncident, supervisor));
incidentsRouter.post('/:id/photos', ...writeRoute(addIncidentPhotosSchema, addIncidentPhotos));
incidentsRouter.post('/:id/actions', ...writeRoute(createActionSchema, createAction, { ...supervisor, status: 201 }));
