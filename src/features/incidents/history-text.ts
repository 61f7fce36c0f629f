import { factorNames, factors, type Factor } from '../../../shared/enums';
import type { HistoryEntryDto } from '../../../shared/schemas/incident-detail';
import { formatDate, formatDateTime } from '../../lib/format';
import { fieldLabels, valueLabel } from './labels';

/** What the incident page knows that turns stored ids into names. */
export interface HistoryContext {
  photoIds: number[];
  actions: { id: number; what: string; ownerName: string }[];
}

/** One audit event as a lab person reads it: no ids, no JSON, no ISO timestamps, no blank fields. */
export interface HistoryLine {
  when: string;
  who: string;
  what: string;
  details: string[];
  reasonLabel: string;
  reason: string | null;
}

const isoInstant = /^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}/;
const isoDate = /^\d{4}-\d{2}-\d{2}$/;

/** Ids and checksums mean nothing to a reader; the names stored beside them say it all. */
const hidden = (key: string) => key === 'id' || /Id$/.test(key) || key === 'sha256' || key === 'mime';

const keyLabels: Record<string, string> = {
  ...fieldLabels,
  photos: 'Photos',
  jars: 'Jars',
  label: 'Label',
  code: 'Code',
  title: 'Title',
  version: 'Version',
  steps: 'Steps',
  username: 'User name',
  role: 'Role',
  operator: 'Operator',
  heldOn: 'Held on',
  trainedOn: 'Trained on',
  supplierLotCode: 'Supplier lot',
  grain: 'Grain',
  rows: 'Rows',
  ignoredColumns: 'Columns ignored',
  held: 'Jars held',
  otherSessionsEnded: 'Other sign-ins ended',
  percentColonised: 'Colonised (%)',
  bytes: 'Size',
  f0: 'F0 (min)',
  at: 'At',
  type: 'Event',
  state: 'State',
};

/** "minutesAtPressure" → "Minutes at pressure" for any field not named above. */
const keyLabel = (key: string) => {
  if (key.startsWith('mail:')) return `Mail “${key.slice(5).replace(/-/g, ' ')}”`;
  if (keyLabels[key]) return keyLabels[key];
  const words = key.replace(/([A-Z])/g, ' $1').toLowerCase();
  return words.charAt(0).toUpperCase() + words.slice(1);
};

const isFactor = (v: string): v is Factor => (factors as readonly string[]).includes(v);

/** A stored value in words, or null when it is blank. */
export function readable(value: unknown, key?: string): string | null {
  if (value === null || value === undefined || value === '') return null;
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'number') {
    if (key === 'bytes')
      return value >= 1_048_576 ? `${(value / 1_048_576).toFixed(1)} MB` : `${Math.round(value / 1024)} kB`;
    return key === 'f0' ? value.toFixed(1) : String(value);
  }
  if (typeof value === 'string') {
    if (isoInstant.test(value)) return formatDateTime(value);
    if (isoDate.test(value)) return formatDate(value);
    if (key === 'factor' && isFactor(value)) return factorNames[value];
    const named = valueLabel(value);
    // Codes with no label ("on-hold") still read as words.
    return named === value && /^[a-z]+(-[a-z]+)+$/.test(value) ? value.replace(/-/g, ' ') : named;
  }
  if (Array.isArray(value)) {
    const parts = value.map((v) => readable(v)).filter((v): v is string => v !== null);
    return parts.length ? parts.join(', ') : null;
  }
  if (typeof value === 'object') return fields(value as Record<string, unknown>).join(' · ') || null;
  return null;
}

/** "Field: value" for each filled, non-id field of a stored record. */
function fields(obj: Record<string, unknown>): string[] {
  return Object.entries(obj)
    .filter(([k]) => !hidden(k))
    .map(([k, v]) => {
      // Photos are counted, not listed: their ids say nothing.
      const shown = k === 'photos' && Array.isArray(v) ? (v.length ? String(v.length) : null) : readable(v, k);
      return shown === null ? null : `${keyLabel(k)}: ${shown}`;
    })
    .filter((s): s is string => s !== null);
}

/** Audit text is either a plain string or JSON (numbers, booleans, objects); read back what was stored. */
export function parseStored(text: string | null): unknown {
  if (text === null) return null;
  if (/^[[{]/.test(text) || /^(true|false|-?\d+(\.\d+)?)$/.test(text)) {
    try {
      return JSON.parse(text) as unknown;
    } catch {
      return text;
    }
  }
  return text;
}

const asObject = (v: unknown): Record<string, unknown> =>
  v !== null && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, unknown>) : {};

/** "step 6 of Sterile technique (version 2)" from a stored step link. */
function stepText(stored: unknown): string {
  const { procedure, version, position } = asObject(stored);
  return [
    typeof position === 'number' ? `step ${position}` : 'a step',
    typeof procedure === 'string' ? `of ${procedure}` : 'of a procedure',
    typeof version === 'number' ? `(version ${version})` : '',
  ]
    .filter(Boolean)
    .join(' ');
}

const nouns: Record<string, string> = {
  incident: 'the incident',
  'corrective-action': 'a corrective action',
  jar: 'a jar',
  'cook-run': 'a cook run',
  culture: 'a culture',
  session: 'a session',
  grain: 'a grain',
  'grain-lot': 'a grain lot',
  'prep-batch': 'a prep batch',
  procedure: 'a procedure',
  photo: 'a photo',
  user: 'a user',
  'training-record': 'a training record',
  'retraining-request': 'a retraining request',
  'cluster-alert': 'a cluster alert',
  'lab-settings': 'the lab settings',
  import: 'a history import',
  'incident-step-link': 'a procedure step link',
};

function actionName(e: HistoryEntryDto, ctx: HistoryContext): string {
  const a = ctx.actions.find((x) => String(x.id) === e.recordId);
  return a ? `the corrective action “${a.what}” (owner ${a.ownerName})` : 'a corrective action';
}

function headline(e: HistoryEntryDto, stored: { old: unknown; new: unknown }, ctx: HistoryContext): string {
  const noun = e.recordType === 'corrective-action' ? actionName(e, ctx) : (nouns[e.recordType] ?? 'a record');
  switch (e.action) {
    case 'create':
      if (e.recordType === 'incident') return 'Reported the incident';
      if (e.recordType === 'corrective-action') {
        const { what, owner } = asObject(stored.new);
        const title = typeof what === 'string' ? `“${what}”` : '';
        return `Added the corrective action ${title}${typeof owner === 'string' ? ` for ${owner}` : ''}`.replace(
          '  ',
          ' ',
        );
      }
      return `Created ${noun}`;
    case 'update':
      return `Changed ${noun}`;
    case 'review':
      return `Reviewed ${noun}`;
    case 'void':
      return `Voided ${noun}`;
    case 'add-photo': {
      const n = ctx.photoIds.indexOf(Number(stored.new));
      return n >= 0 ? `Added a photo (photo ${n + 1} of ${ctx.photoIds.length})` : 'Added a photo';
    }
    case 'link-step':
      return `Linked to ${stepText(stored.new)}`;
    case 'unlink-step':
      return `Unlinked from ${stepText(stored.old)}`;
    case 'status':
      return `Status of ${noun} changed`;
    case 'state':
      return `State of ${noun} changed`;
    case 'change-password':
      return 'Changed their password';
    case 'mail-preference':
      return 'Changed a mail preference';
    case 'readings':
      return `Changed the temperature log of ${noun}`;
    case 'lineage-hold':
      return `Put the jars made from ${noun} on hold`;
    case 'jar-mark-undone':
      return 'Undid a mark made on the shelf walk';
    case 'seen':
      return `Looked at ${noun}`;
    case 'close':
      return `Closed ${noun}`;
    case 'import':
      return 'Imported a history file';
    case 'publish-version':
      return `Published a new version of ${noun}`;
    case 'upload':
      return 'Uploaded a photo';
    default:
      return e.action.startsWith('jar-')
        ? `Recorded “${e.action.slice(4).replace(/-/g, ' ')}” on ${noun}`
        : `${e.action.charAt(0).toUpperCase()}${e.action.slice(1).replace(/-/g, ' ')} on ${noun}`;
  }
}

/** What changed, one line per field; nothing for events whose headline says it all. */
function details(e: HistoryEntryDto, stored: { old: unknown; new: unknown }): string[] {
  if (['add-photo', 'void', 'link-step', 'unlink-step'].includes(e.action)) return [];
  const isRecord = (v: unknown) => v !== null && typeof v === 'object' && !Array.isArray(v);
  if (e.field === null || isRecord(stored.new) || isRecord(stored.old)) {
    const was = e.field === null ? [] : fields(asObject(stored.old));
    return [...(was.length ? [`Was ${was.join(' · ')}`] : []), ...fields(asObject(stored.new))];
  }
  const label = keyLabel(e.field);
  const from = readable(stored.old, e.field);
  const to = readable(stored.new, e.field);
  if (from === null && to === null) return [];
  if (from === null) return [`${label} set to ${to}`];
  if (to === null) return [`${label} cleared (was ${from})`];
  return [`${label}: ${from} → ${to}`];
}

export function describeHistoryEntry(e: HistoryEntryDto, ctx: HistoryContext): HistoryLine {
  const stored = { old: parseStored(e.oldValue), new: parseStored(e.newValue) };
  return {
    when: formatDateTime(e.at),
    who: e.userName,
    what: headline(e, stored, ctx),
    details: details(e, stored),
    reasonLabel: e.action === 'link-step' ? 'Note' : 'Reason',
    reason: e.reason && e.reason.trim() ? e.reason : null,
  };
}
