import type { HistoryEntryDto } from '../../../../shared/schemas/incidents';
import { fieldLabels, valueLabel } from '../labels';
import { formatDateTime } from '../../../lib/format';

const actionLabels: Record<string, string> = {
  create: 'Created',
  update: 'Changed',
  review: 'Reviewed',
  void: 'Voided',
  'add-photo': 'Photo added',
  'link-step': 'Linked to a procedure step',
  'unlink-step': 'Unlinked from a procedure step',
};

/** A step link is stored as its ids and names; a reader wants "step 6 of Sterile technique, version 2". */
function stepText(text: string | null): string {
  const parsed = parseObject(text);
  if (!parsed) return text ?? '';
  const { procedure, version, position } = parsed as { procedure?: string; version?: number; position?: number };
  return [
    position ? `step ${position}` : 'a step',
    procedure ? `of ${procedure}` : '',
    version ? `(version ${version})` : '',
  ]
    .filter(Boolean)
    .join(' ');
}

function parseObject(text: string | null): Record<string, unknown> | null {
  if (!text) return null;
  try {
    const parsed = JSON.parse(text) as unknown;
    return parsed !== null && typeof parsed === 'object' && !Array.isArray(parsed)
      ? (parsed as Record<string, unknown>)
      : null;
  } catch {
    return null;
  }
}

const subject = (e: HistoryEntryDto) =>
  e.recordType === 'corrective-action'
    ? `Action ${e.recordId}`
    : e.recordType === 'incident-step-link'
      ? 'Procedure step link'
      : null;

/** Ids mean nothing to a reader; the names beside them say it all. */
const hiddenKeys = new Set(['linkId', 'stepId', 'incidentId', 'photoId', 'id']);

/** A created record's snapshot is stored as JSON; show what was set as "field: value", leaving out blanks and ids. */
function snapshot(text: string | null): string {
  const parsed = parseObject(text);
  if (!parsed) return text ?? '';
  return Object.entries(parsed)
    .filter(([k, v]) => !hiddenKeys.has(k) && v !== null && v !== undefined && v !== '')
    .map(([k, v]) => {
      const scalar = typeof v === 'string' || typeof v === 'number' || typeof v === 'boolean';
      const shown = Array.isArray(v) ? v.join(', ') : scalar ? valueLabel(String(v)) : '';
      return `${fieldLabels[k] ?? k}: ${shown}`;
    })
    .join(' · ');
}

function change(e: HistoryEntryDto) {
  if (e.field === null) return <span className="break-words text-muted">{snapshot(e.newValue)}</span>;
  const field = fieldLabels[e.field] ?? e.field;
  if (e.action === 'add-photo') return <span>A photo was added.</span>;
  if (e.action === 'link-step') return <span>Linked to {stepText(e.newValue)}.</span>;
  if (e.action === 'unlink-step') return <span>Unlinked from {stepText(e.oldValue)}.</span>;
  return (
    <span>
      <span className="font-medium">{field}</span>: {valueLabel(e.oldValue)} →{' '}
      <span className="font-medium">{valueLabel(e.newValue)}</span>
    </span>
  );
}

/** The audit trail as recorded: who, server time, what changed from what to what, and why. */
export function HistoryList({ entries }: { entries: HistoryEntryDto[] }) {
  return (
    <ol className="flex flex-col divide-y divide-line" aria-label="History">
      {entries.map((e) => (
        <li key={e.id} className="flex flex-col gap-0.5 py-2 print:break-inside-avoid">
          <p className="text-sm text-muted">
            <time dateTime={e.at}>{formatDateTime(e.at)}</time> ·{' '}
            <span className="font-medium text-ink">{e.userName}</span> · {actionLabels[e.action] ?? e.action}
            {subject(e) ? ` · ${subject(e)}` : ''}
          </p>
          <p>{change(e)}</p>
          {e.reason && <p className="text-sm">Reason: {e.reason}</p>}
        </li>
      ))}
    </ol>
  );
}
