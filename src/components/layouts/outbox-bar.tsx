import { Link } from 'react-router';
import { paths } from '../../config/paths';
import { useOutbox } from '../../lib/outbox/use-outbox';
import { outboxSummary } from '../../lib/outbox/outbox-summary';

/** Always in sight while anything is still on the phone, so nobody closes the app thinking it is sent. */
export function OutboxBar() {
  const { items } = useOutbox();
  if (!items?.length) return null;
  const { waiting, refused } = outboxSummary(items);
  return (
    <Link
      to={paths.outbox.to()}
      data-testid="outbox-bar"
      className="no-print flex min-h-touch items-center justify-between gap-2 border-b border-warn bg-warn-soft px-4 py-2 text-sm font-medium"
    >
      <span aria-live="polite">
        {waiting}
        {waiting && refused ? ' · ' : ''}
        {refused ? <span className="text-danger">{refused} refused: needs you</span> : null}
      </span>
      <span className="text-accent underline">Open</span>
    </Link>
  );
}
