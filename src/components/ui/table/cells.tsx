import type { ReactNode } from 'react';
import { formatDate } from '../../../lib/format';
import { TextLink } from '../text-link';

export const dash = <T,>(value: T | null | undefined): T | '—' =>
  value === null || value === undefined || value === '' ? '—' : value;

/** A row's code, leading to its own page. */
export function CodeLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <TextLink to={to} className="font-medium">
      {children}
    </TextLink>
  );
}

export function DateCell({ value }: { value: string | null | undefined }) {
  return <span className="whitespace-nowrap">{value ? formatDate(value) : '—'}</span>;
}
