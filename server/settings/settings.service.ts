import type { EntityManager } from 'typeorm';
import type { LabSettingsDto, UpdateLabSettingsInput } from '../../shared/schemas/settings';
import { diffEntries, recordAudit, type Actor } from '../audit/audit.service';
import { config } from '../core/config';
import { dataSource } from '../db/data-source';
import type { LabSettings } from './lab-settings.entity';
import { settingsRepository } from './settings.repository';
import { recountMovedJars } from '../tallies/tallies.service';

/** The settings row is created by the LabDefaults migration, so it always exists. */
export async function getLabSettings(manager?: EntityManager): Promise<LabSettings> {
  const row = await settingsRepository.find(manager);
  if (!row) throw new Error('lab_settings row 1 is missing: run the migrations');
  return row;
}

/** The observation window as committed, waiting for a change in progress (recounts key rooms on it). */
export async function committedWindowDays(m: EntityManager): Promise<number> {
  const row = await settingsRepository.share(m);
  if (!row) throw new Error('lab_settings row 1 is missing: run the migrations');
  return row.observationWindowDays;
}

export const toLabSettingsDto = (s: LabSettings): LabSettingsDto => ({
  cookBucketEdges: s.cookBucketEdges,
  lethalityTarget: s.lethalityTarget,
  containerMinutes: s.containerMinutes,
  contaminationTarget: s.contaminationTarget,
  observationWindowDays: s.observationWindowDays,
  clusterIncidents: s.clusterIncidents,
  clusterDays: s.clusterDays,
  updatedAt: s.updatedAt.toISOString(),
  timeZone: config().LAB_TIME_ZONE,
});

export async function readLabSettings(): Promise<LabSettingsDto> {
  return toLabSettingsDto(await getLabSettings());
}

export async function updateLabSettings(actor: Actor, input: UpdateLabSettingsInput): Promise<LabSettingsDto> {
  return dataSource.transaction(async (m) => {
    // Locked so two admins saving at once cannot interleave their audit trails.
    const row = await settingsRepository.lock(m);
    if (!row) throw new Error('lab_settings row 1 is missing: run the migrations');
    const entries = diffEntries({ action: 'update', recordType: 'lab-settings', recordId: 1 }, row, input);
    if (entries.length === 0) return toLabSettingsDto(row);
    const windowChanged =
      input.observationWindowDays !== undefined && input.observationWindowDays !== row.observationWindowDays;
    Object.assign(row, input);
    await settingsRepository.save(m, row);
    await recordAudit(m, actor, entries);
    // A jar's room in the counts is where it stood at the end of its window: a new window moves jars.
    if (windowChanged) await recountMovedJars(m);
    return toLabSettingsDto(await getLabSettings(m));
  });
}
