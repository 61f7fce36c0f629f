import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { Spinner } from '../../../components/ui/spinner';
import { flushOutbox } from '../../../lib/outbox/outbox-sender';
import { outboxSummary } from '../../../lib/outbox/outbox-summary';
import { useOutbox } from '../../../lib/outbox/use-outbox';
import { OutboxEntry } from './outbox-entry';

/** Everything this phone still holds for the server, oldest first, and what the server refused. */
export function OutboxScreen() {
  const { items, progress } = useOutbox();
  const [sending, setSending] = useState(false);
  const summary = items ? outboxSummary(items) : undefined;
  return (
    <div className="mx-auto max-w-xl space-y-4">
      <PageHeader
        title="Waiting to send"
        description="Flags, photos and shelf marks stay on this phone until the server has them; they send themselves when the connection returns."
      />
      {!items && <Spinner label="Reading this phone’s queue" />}
      {items?.length === 0 && <EmptyState title="Nothing waiting: everything has reached the server." />}
      {summary?.waiting && (
        <div className="flex items-center justify-between gap-2">
          <p className="font-medium">{summary.waiting}</p>
          <Button
            variant="secondary"
            pending={sending}
            onClick={() => {
              setSending(true);
              void flushOutbox().finally(() => setSending(false));
            }}
          >
            Send now
          </Button>
        </div>
      )}
      {items && items.length > 0 && (
        <ul className="space-y-3" aria-label="Queue">
          {items.map((item) => (
            <OutboxEntry key={item.id} item={item} progress={progress(item.id)} />
          ))}
        </ul>
      )}
    </div>
  );
}
