import type { HistoryEntryDto } from '../../../../shared/schemas/incidents';
import { fieldLabels, valueLabel } from '../labels';
import { formatDateTime } from '../../../lib/format';

const actionLabels: Record<string, string> = {
  create: 'Created',
  update: 'Changed',
  review: 'Reviewed',
  void: 'Voided',
  'add-photo': 'Photo added',
};

const subject = (e: HistoryEntryDto) =>
  e.recordType === 'corrective-action'
    ? `Action ${e.recordId}`
    : e.recordType === 'incident-step-link'
      ? 'Procedure step link'
      : null;

/** A created record's snapshot is stored as JSON; show it as "field: value" pairs. */
function snapshot(text: string | null): string {
  if (!text) return '';
  try {
    const parsed = JSON.parse(text) as unknown;
    if (parsed === null || typeof parsed !== 'object' || Array.isArray(parsed)) return text;
    return Object.entries(parsed)
      .map(
        ([k, v]) =>
          `${fieldLabels[k] ?? k}: ${Array.isArray(v) ? v.join(', ') || '—' : valueLabel(v === null ? null : String(v))}`,
      )
      .join(' · ');
  } catch {
    return text;
  }
}

function change(e: HistoryEntryDto) {
  if (e.field === null) return <span className="break-words text-muted">{snapshot(e.newValue)}</span>;
  const field = fieldLabels[e.field] ?? e.field;
  if (e.action === 'add-photo')
    return (
      <span>
        {field} {e.newValue}
      </span>
    );
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
