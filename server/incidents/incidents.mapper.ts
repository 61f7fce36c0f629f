import type { CorrectiveActionDto } from '../../shared/schemas/corrective-actions';
import type { HistoryEntryDto, IncidentDetailDto } from '../../shared/schemas/incident-detail';
import type { IncidentListItemDto } from '../../shared/schemas/incidents';
import type { AuditEventRecord } from '../audit/audit.service';
import type { CorrectiveAction } from './corrective-action.entity';
import type { Incident } from './incident.entity';

export const toIncidentListItem = (i: Incident, jarLabels: string[], photoCount: number): IncidentListItemDto => ({
  id: i.id,
  foundAt: i.foundAt.toISOString(),
  foundOn: i.foundOn,
  foundByName: i.foundByName,
  stage: i.stage,
  contaminant: i.contaminant,
  severity: i.severity,
  status: i.status,
  verdict: i.verdict,
  voided: i.voided,
  jarLabels,
  jarCount: jarLabels.length,
  photoCount,
  version: i.version,
});

export const toActionDto = (a: CorrectiveAction, today: string): CorrectiveActionDto => ({
  id: a.id,
  incidentId: a.incidentId,
  what: a.what,
  ownerId: a.ownerId,
  ownerName: a.ownerName,
  ownerEmail: a.ownerEmail,
  dueOn: a.dueOn,
  doneOn: a.doneOn,
  verification: a.verification,
  factor: a.factor,
  level: a.level,
  overdue: a.doneOn === null && a.dueOn < today,
  createdAt: a.createdAt.toISOString(),
});

export const toHistoryEntry = (e: AuditEventRecord): HistoryEntryDto => ({
  id: String(e.id),
  at: e.at.toISOString(),
  userName: e.userName,
  action: e.action,
  recordType: e.recordType,
  recordId: e.recordId,
  field: e.field,
  oldValue: e.oldValue,
  newValue: e.newValue,
  reason: e.reason,
});

export const toIncidentDetail = (
  i: Incident,
  parts: Pick<IncidentDetailDto, 'jars' | 'photos' | 'stepLinks' | 'actions' | 'history'>,
): IncidentDetailDto => ({
  id: i.id,
  foundAt: i.foundAt.toISOString(),
  foundOn: i.foundOn,
  foundById: i.foundById,
  foundByName: i.foundByName,
  stage: i.stage,
  contaminant: i.contaminant,
  signColour: i.signColour,
  signSmell: i.signSmell,
  signTexture: i.signTexture,
  severity: i.severity,
  sealed: i.sealed,
  sterilisedBeforeDisposal: i.sterilisedBeforeDisposal,
  status: i.status,
  verdict: i.verdict,
  voided: i.voided,
  voidReason: i.voidReason,
  causeCategory: i.causeCategory,
  rootCauseNotes: i.rootCauseNotes,
  notes: i.notes,
  imported: i.imported,
  version: i.version,
  createdAt: i.createdAt.toISOString(),
  updatedAt: i.updatedAt.toISOString(),
  ...parts,
});
