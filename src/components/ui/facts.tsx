import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

/** A record's facts as a definition list, three to a row on wider screens. */
export function Facts({ className, children }: { className?: string; children: ReactNode }) {
  return <dl className={cx('grid gap-4 sm:grid-cols-3', className)}>{children}</dl>;
}

export function Fact({ term, children }: { term: string; children: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5">
      <dt className="text-sm text-muted">{term}</dt>
      <dd className="font-medium">{children}</dd>
    </div>
  );
}
