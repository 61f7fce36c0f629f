import type { HistoryEntryDto } from '../../../../shared/schemas/incident-detail';
import { describeHistoryEntry, type HistoryContext } from '../history-text';

/** The audit trail as recorded, in words: when on the lab's clock, who, what, and why. */
export function HistoryList({ entries, context }: { entries: HistoryEntryDto[]; context: HistoryContext }) {
  if (entries.length === 0) return <p className="text-muted">Nothing recorded yet.</p>;
  return (
    <ol className="flex flex-col divide-y divide-line" aria-label="History">
      {entries.map((e) => {
        const line = describeHistoryEntry(e, context);
        return (
          <li key={e.id} className="flex flex-col gap-0.5 py-2 print:break-inside-avoid">
            <p className="text-sm text-muted">
              <time dateTime={e.at}>{line.when}</time> · <span className="font-medium text-ink">{line.who}</span>
            </p>
            <p className="font-medium">{line.what}</p>
            {line.details.map((d) => (
              <p key={`${e.id}-${d}`} className="text-sm break-words">
                {d}
              </p>
            ))}
            {line.reason && (
              <p className="text-sm">
                {line.reasonLabel}: {line.reason}
              </p>
            )}
          </li>
        );
      })}
    </ol>
  );
}
