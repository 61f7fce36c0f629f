import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDialog } from '../../../components/ui/confirm-dialog';
import { TextInput } from '../../../components/ui/text-input';
import { formatDateTime } from '../../../lib/format';
import { describeItem, type OutboxItem } from '../../../lib/outbox/outbox-items';
import { flushOutbox } from '../../../lib/outbox/outbox-sender';
import { putItem, removeItem } from '../../../lib/outbox/outbox-store';

const resend = async (item: OutboxItem) => {
  await putItem({ ...item, state: 'waiting', reason: undefined, reasonField: undefined });
  await flushOutbox();
};

/** A refused flag naming a label can be fixed here: the label is the usual mistake. */
function FixLabel({ item }: { item: OutboxItem & { kind: 'flag' } }) {
  const [label, setLabel] = useState(item.input.jarLabels?.join(' ') ?? '');
  return (
    <form
      className="flex items-end gap-2"
      onSubmit={(e) => {
        e.preventDefault();
        const jarLabels = label.split(/[\s,;]+/).filter(Boolean);
        if (jarLabels.length) void resend({ ...item, input: { ...item.input, jarLabels } });
      }}
    >
      <TextInput label="Jar label" value={label} onChange={(e) => setLabel(e.target.value)} autoComplete="off" />
      <Button type="submit">Send again</Button>
    </form>
  );
}

export function OutboxEntry({ item, progress }: { item: OutboxItem; progress: number | undefined }) {
  const [confirm, setConfirm] = useState(false);
  const labelProblem = item.kind === 'flag' && /^jar(Labels|Ids)/.test(item.reasonField ?? '');
  return (
    <li className="space-y-2 rounded-md border border-line bg-surface-raised p-3">
      <div className="flex items-baseline justify-between gap-2">
        <p className="font-medium">{describeItem(item)}</p>
        <span className="shrink-0 text-sm text-muted">{formatDateTime(new Date(item.createdAt))}</span>
      </div>
      {item.state === 'waiting' &&
        (progress === undefined ? (
          <p className="text-sm text-muted">Waiting to send</p>
        ) : (
          <progress className="h-2 w-full accent-accent" max={1} value={progress} aria-label="Sending" />
        ))}
      {item.state === 'refused' && (
        <p role="alert" className="text-sm font-medium text-danger">
          Refused: {item.reason}
        </p>
      )}
      {labelProblem && item.kind === 'flag' && <FixLabel item={item} />}
      <div className="flex gap-2">
        {item.state === 'refused' && !labelProblem && (
          <Button variant="secondary" onClick={() => void resend(item)}>
            Try again
          </Button>
        )}
        <Button variant="ghost" onClick={() => setConfirm(true)}>
          Discard
        </Button>
      </div>
      <ConfirmDialog
        open={confirm}
        onClose={() => setConfirm(false)}
        onConfirm={() => void removeItem(item.id).then(() => setConfirm(false))}
        title="Discard from this phone?"
        confirmLabel="Discard"
      >
        {describeItem(item)} has not reached the server. Discarding it deletes it from this phone for good.
      </ConfirmDialog>
    </li>
  );
}
