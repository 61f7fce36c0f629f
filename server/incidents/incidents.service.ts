import type { EntityManager } from 'typeorm';
import type { Page } from '../../shared/schemas/common';
import {
  descriptiveIncidentFields,
  type AddIncidentPhotosInput,
  type CreateIncidentInput,
  type IncidentListItemDto,
  type IncidentListQuery,
  type UpdateIncidentInput,
} from '../../shared/schemas/incidents';
import type { IncidentDetailDto } from '../../shared/schemas/incident-detail';
import type { FieldIssue } from '../../shared/schemas/common';
import { diffEntries, recordAudit } from '../audit/audit.service';
import type { SessionUser } from '../core/auth-guards';
import { forbidden, notFound, unprocessable } from '../core/errors';
import { localDate, todayLocal } from '../core/local-time';
import { dataSource } from '../db/data-source';
import { attachRecord, claimKey, type IdempotencyClaim } from '../idempotency/idempotency.service';
import type { JarRecord } from '../jars/jar-status.service';
import { toPhotoDto } from '../photos/photos.mapper';
import { requirePhotos } from '../photos/photos.service';
import { emitIncidentCreated } from './incident-events';
import type { Incident } from './incident.entity';
import { incidentDetailRepository } from './incident-detail.repository';
import { canEditDescriptive, checkFoundAt, loadForChange } from './incident-rules';
import { incidentsRepository } from './incidents.repository';
import { toActionDto, toHistoryEntry, toIncidentDetail, toIncidentListItem } from './incidents.mapper';
import { syncJarStatuses } from './jar-contamination';
import { recountJars } from '../tallies/tallies.service';
import { pageResult } from '../core/paging';

async function resolveJars(
  m: EntityManager,
  input: Pick<CreateIncidentInput, 'jarIds' | 'jarLabels'>,
): Promise<JarRecord[]> {
  const labels = input.jarLabels ?? [];
  const ids = input.jarIds ?? [];
  const [byLabel, byId] = await Promise.all([
    incidentsRepository.findJarsByLabels(m, labels),
    incidentsRepository.findJarsByIds(m, ids),
  ]);
  const issues: FieldIssue[] = [];
  labels.forEach((label, i) => {
    if (!byLabel.some((j) => j.label.toLowerCase() === label.toLowerCase()))
      issues.push({ path: `jarLabels.${i}`, message: `no jar is labelled ${label}` });
  });
  ids.forEach((id, i) => {
    if (!byId.some((j) => j.id === id)) issues.push({ path: `jarIds.${i}`, message: `no jar has id ${id}` });
  });
  if (issues.length) throw unprocessable(`${issues[0]?.path}: ${issues[0]?.message}`, issues);
  return [...new Map([...byLabel, ...byId].map((j) => [j.id, j])).values()];
}

export async function createIncident(
  user: SessionUser,
  input: CreateIncidentInput,
  claim?: IdempotencyClaim,
): Promise<IncidentDetailDto> {
  const foundAt = input.foundAt ? new Date(input.foundAt) : new Date();
  const foundOn = localDate(foundAt);
  const created = await dataSource.transaction(async (m) => {
    await claimKey(m, claim);
    const jars = await resolveJars(m, input);
    checkFoundAt(foundAt, foundOn, jars);
    const photos = input.photoIds?.length ? await requirePhotos(m, input.photoIds, 'photoIds') : [];
    const incident = await incidentsRepository.insert(m, {
      foundAt,
      foundOn,
      foundById: user.id,
      foundByName: user.displayName,
      createdById: user.id,
      stage: input.stage,
      contaminant: input.contaminant,
      signColour: input.signColour || null,
      signSmell: input.signSmell || null,
      signTexture: input.signTexture || null,
      severity: input.severity,
      sealed: input.sealed,
      sterilisedBeforeDisposal: input.sterilisedBeforeDisposal,
      notes: input.notes || null,
    });
    await attachRecord(m, claim, incident.id);
    await incidentsRepository.insertJarLinks(
      m,
      jars.map((j) => ({ incidentId: incident.id, jarId: j.id })),
    );
    if (photos.length)
      await incidentsRepository.insertPhotoLinks(
        m,
        photos.map((p) => ({ incidentId: incident.id, photoId: p.id, addedById: user.id })),
      );
    const labels = jars.map((j) => j.label).sort();
    const snapshot = {
      contaminant: incident.contaminant,
      severity: incident.severity,
      stage: incident.stage,
      foundAt: incident.foundAt,
      jars: labels,
      photos: photos.map((p) => p.id),
    };
    await recordAudit(m, user, [
      { action: 'create', recordType: 'incident', recordId: incident.id, newValue: snapshot },
    ]);
    await syncJarStatuses(
      m,
      user,
      jars.map((j) => j.id),
      `incident ${incident.id} flagged`,
    );
    return { incident, labels };
  });
  const { incident, labels } = created;
  emitIncidentCreated({
    id: incident.id,
    contaminant: incident.contaminant,
    severity: incident.severity,
    stage: incident.stage,
    foundAt: incident.foundAt.toISOString(),
    foundByName: incident.foundByName,
    jarLabels: labels,
  });
  return getIncident(incident.id);
}

export async function listIncidents(q: IncidentListQuery): Promise<Page<IncidentListItemDto>> {
  const [rows, total] = await incidentsRepository.list(q);
  const ids = rows.map((r) => r.id);
  const [codes, photos] = await Promise.all([incidentsRepository.jarCodes(ids), incidentsRepository.photoCounts(ids)]);
  const items = rows.map((r) => toIncidentListItem(r, codes.get(r.id)?.labels ?? [], photos.get(r.id) ?? 0));
  return pageResult(items, total, q);
}

/** Whether anyone has filed an incident, as against incidents imported with a history. */
export const anyFiledIncident = () => incidentsRepository.anyFiled();

/** For other modules: the incident row itself, or null. */
export const findIncident = (id: number) => incidentsRepository.findById(id);

export async function getIncident(id: number): Promise<IncidentDetailDto> {
  const incident = await incidentsRepository.findById(id);
  if (!incident) throw notFound('Incident');
  const [jars, photos, stepLinks, actions, linkIds] = await Promise.all([
    incidentDetailRepository.jars(id),
    incidentDetailRepository.photos(id),
    incidentDetailRepository.stepLinks(id),
    incidentsRepository.actionsOf(id),
    incidentsRepository.stepLinkIdsOf(id),
  ]);
  const history = await incidentsRepository.history(
    id,
    actions.map((a) => a.id),
    linkIds,
  );
  const today = todayLocal();
  return toIncidentDetail(incident, {
    jars,
    photos: photos.map((p) => ({ ...toPhotoDto(p.photo), caption: p.caption, addedAt: p.addedAt.toISOString() })),
    stepLinks,
    actions: actions.map((a) => toActionDto(a, today)),
    history: history.map(toHistoryEntry),
  });
}

const notYours = () => forbidden('Only the finder edits an open incident; a supervisor edits the rest.');

export async function updateIncident(
  user: SessionUser,
  id: number,
  input: UpdateIncidentInput,
): Promise<IncidentDetailDto> {
  await dataSource.transaction(async (m) => {
    const incident = await loadForChange(m, id, input.version);
    if (!canEditDescriptive(user, incident)) throw notYours();
    const changes: Partial<Incident> = {};
    for (const key of descriptiveIncidentFields) {
      const value = input[key];
      if (value === undefined) continue;
      Object.assign(changes, { [key]: key === 'foundAt' ? new Date(value as string) : value === '' ? null : value });
    }
    if (changes.foundAt) {
      const foundOn = localDate(changes.foundAt);
      const jarIds = await incidentsRepository.jarIdsOf(m, id);
      checkFoundAt(changes.foundAt, foundOn, await incidentsRepository.findJarsByIds(m, jarIds));
    }
    const entries = diffEntries(
      { action: 'update', recordType: 'incident', recordId: id, reason: input.reason ?? null },
      incident,
      changes,
    );
    if (entries.length === 0) return;
    Object.assign(incident, changes, changes.foundAt ? { foundOn: localDate(changes.foundAt) } : {});
    await incidentsRepository.save(m, incident);
    await recordAudit(m, user, entries);
    // When and what was found are counted (days to finding, contaminant, the room at that moment).
    if (changes.foundAt || changes.contaminant) await recountJars(m, await incidentsRepository.jarIdsOf(m, id));
  });
  return getIncident(id);
}

export async function addIncidentPhotos(
  user: SessionUser,
  id: number,
  input: AddIncidentPhotosInput,
  claim?: IdempotencyClaim,
): Promise<IncidentDetailDto> {
  await dataSource.transaction(async (m) => {
    await claimKey(m, claim, id);
    const incident = await loadForChange(m, id);
    if (!canEditDescriptive(user, incident)) throw notYours();
    const photos = await requirePhotos(m, input.photoIds, 'photoIds');
    const existing = new Set(await incidentsRepository.photoIdsOf(m, id));
    const fresh = photos.filter((p) => !existing.has(p.id));
    if (fresh.length === 0) return;
    await incidentsRepository.insertPhotoLinks(
      m,
      fresh.map((p) => ({ incidentId: id, photoId: p.id, addedById: user.id })),
    );
    await recordAudit(
      m,
      user,
      fresh.map((p) => ({
        action: 'add-photo',
        recordType: 'incident',
        recordId: id,
        field: 'photos',
        newValue: p.id,
      })),
    );
  });
  return getIncident(id);
}
