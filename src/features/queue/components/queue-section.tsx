import type { ReactNode } from 'react';
import { Link } from 'react-router';

interface QueueSectionProps {
  id: string;
  title: string;
  total: number;
  /** Where the whole list lives, when more wait than are shown. */
  allTo?: string;
  empty: string;
  children: ReactNode;
}

/** One list of the queue: a heading with its count, a few items, and a link to the rest. */
export function QueueSection({ id, title, total, allTo, empty, children }: QueueSectionProps) {
  return (
    <section aria-labelledby={id} className="rounded-lg border-2 border-line bg-surface-raised p-4">
      <h3 id={id} className="flex items-baseline justify-between gap-2 font-semibold">
        <span>{title}</span>
        <span className="tabular-nums text-muted">{total}</span>
      </h3>
      {total === 0 ? (
        <p className="mt-2 text-muted">{empty}</p>
      ) : (
        <ul className="mt-2 flex flex-col gap-2">{children}</ul>
      )}
      {allTo && total > 0 && (
        <Link to={allTo} className="mt-3 inline-block font-medium text-accent underline">
          See all {total}
        </Link>
      )}
    </section>
  );
}

export function QueueItem({ to, children, aside }: { to: string; children: ReactNode; aside?: ReactNode }) {
  return (
    <li className="flex flex-wrap items-baseline justify-between gap-x-3">
      <Link to={to} className="font-medium text-accent underline">
        {children}
      </Link>
      {aside && <span className="text-sm text-muted">{aside}</span>}
    </li>
  );
}
