import type { JarStatus } from '../../shared/enums';
import type { JarEventDto } from '../../shared/schemas/jar-events';
import type { JarRowDto } from '../../shared/schemas/jars';
import type { JarEvent } from './jar-event.entity';
import { dateOnly, dateOrNull, numberOrNull } from '../core/raw-values';

export const isoOrNull = (value: Date | string | null | undefined): string | null =>
  value === null || value === undefined
    ? null
    : value instanceof Date
      ? value.toISOString()
      : new Date(value).toISOString();
const strOrNull = (value: string | null | undefined): string | null => value ?? null;

/** The aliased columns of jarsRepository's row query. */
export interface JarRawRow {
  id: number | string;
  label: string;
  status: JarStatus;
  grainId: number | string;
  grain: string;
  prepBatchId: number | null;
  prepBatchCode: string | null;
  cookRunId: number | null;
  cookRunCode: string | null;
  sessionId: number | null;
  sessionCode: string | null;
  cultureId: number | null;
  cultureCode: string | null;
  parentJarId: number | null;
  parentJarLabel: string | null;
  inoculumMl: number | null;
  room: string | null;
  shelf: string | null;
  shelfPosition: number | null;
  inoculatedAt: Date | string;
  inoculatedOn: Date | string;
  colonisedOn: Date | string | null;
  endedOn: Date | string | null;
  imported: number | boolean;
}

export const toJarRow = (r: JarRawRow): JarRowDto => ({
  id: Number(r.id),
  label: r.label,
  status: r.status,
  grainId: Number(r.grainId),
  grain: r.grain,
  prepBatchId: numberOrNull(r.prepBatchId),
  prepBatchCode: strOrNull(r.prepBatchCode),
  cookRunId: numberOrNull(r.cookRunId),
  cookRunCode: strOrNull(r.cookRunCode),
  sessionId: numberOrNull(r.sessionId),
  sessionCode: strOrNull(r.sessionCode),
  cultureId: numberOrNull(r.cultureId),
  cultureCode: strOrNull(r.cultureCode),
  parentJarId: numberOrNull(r.parentJarId),
  parentJarLabel: strOrNull(r.parentJarLabel),
  inoculumMl: numberOrNull(r.inoculumMl),
  room: strOrNull(r.room),
  shelf: strOrNull(r.shelf),
  shelfPosition: numberOrNull(r.shelfPosition),
  inoculatedAt: isoOrNull(r.inoculatedAt) ?? '',
  inoculatedOn: dateOnly(r.inoculatedOn),
  colonisedOn: dateOrNull(r.colonisedOn),
  endedOn: dateOrNull(r.endedOn),
  imported: Boolean(Number(r.imported)),
});

/** Colonised is stored as a status event and taking a jar off hold as a hold event that lifts it. */
function eventInputType(e: JarEvent): string {
  if (e.type === 'status' && e.newStatus === 'colonised') return 'colonised';
  if (e.type === 'hold' && e.newStatus !== null && e.newStatus !== 'on-hold') return 'resume';
  return e.type;
}

export const toJarEventDto = (e: JarEvent): JarEventDto => ({
  id: e.id,
  type: eventInputType(e),
  at: e.at.toISOString(),
  onDate: dateOnly(e.onDate),
  byName: e.byName,
  percentColonised: e.percentColonised,
  room: e.room,
  shelf: e.shelf,
  releasedTo: e.releasedTo,
  releasedToWho: e.releasedToWho,
  newStatus: e.newStatus,
  photoId: e.photoId,
  note: e.note,
});

export const jarCsvHeader = [
  'label',
  'status',
  'grain',
  'prep_batch',
  'cook_run',
  'session',
  'culture',
  'parent_jar',
  'inoculum_ml',
  'room',
  'shelf',
  'shelf_position',
  'inoculated_at',
  'inoculated_on',
  'colonised_on',
  'ended_on',
];

export const jarCsvRow = (j: JarRowDto): unknown[] => [
  j.label,
  j.status,
  j.grain,
  j.prepBatchCode,
  j.cookRunCode,
  j.sessionCode,
  j.cultureCode,
  j.parentJarLabel,
  j.inoculumMl,
  j.room,
  j.shelf,
  j.shelfPosition,
  j.inoculatedAt,
  j.inoculatedOn,
  j.colonisedOn,
  j.endedOn,
];
