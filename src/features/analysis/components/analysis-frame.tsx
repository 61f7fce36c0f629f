import type { ReactNode } from 'react';
import { NavLink, useSearchParams } from 'react-router';
import { buttonClasses } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { Notice } from '../../../components/ui/notice';
import { Spinner } from '../../../components/ui/spinner';
import { TextInput } from '../../../components/ui/text-input';
import { paths } from '../../../config/paths';
import { errorMessage } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { Pager } from '../../../components/ui/table/pager';
import { pageSizes, patchParams } from '../../../lib/list-params';
import type { Period } from '../api/analysis-queries';

const tabs = [
  { label: 'Weekly table', to: paths.analysisWeekly.to },
  { label: 'Likely causes', to: paths.analysisCauses.to },
  { label: 'Rates', to: paths.analysisRates.to },
  { label: 'Cross-table', to: paths.analysisCrosstab.to },
  { label: 'Colonisation', to: paths.analysisColonisation.to },
  { label: 'Cook lethality', to: paths.analysisLethality.to },
  { label: 'Did it work?', to: paths.analysisActions.to },
] as const;

/** The analysis screens share one period, so switching screens keeps it. */
export function AnalysisTabs() {
  const [params] = useSearchParams();
  const keep = { from: params.get('from') ?? undefined, to: params.get('to') ?? undefined };
  return (
    <nav aria-label="Analysis screens" className="no-print mb-6 flex flex-wrap gap-2 border-b-2 border-line pb-3">
      {tabs.map((t) => (
        <NavLink
          key={t.label}
          to={t.to(keep)}
          className={({ isActive }) =>
            cx(
              'rounded-md px-3 py-2 font-medium',
              isActive ? 'bg-accent text-accent-fg' : 'text-accent hover:bg-accent-soft',
            )
          }
        >
          {t.label}
        </NavLink>
      ))}
    </nav>
  );
}

export function PeriodPicker({ period, children }: { period: Period; children?: ReactNode }) {
  const [params, setParams] = useSearchParams();
  const set = (key: 'from' | 'to', value: string) => setParams(patchParams(params, { [key]: value || undefined }));
  return (
    <div className="no-print mb-6 flex flex-wrap items-end gap-4">
      <TextInput
        type="date"
        label="From"
        hint="Jars inoculated on or after"
        value={period.from ?? ''}
        max={period.to}
        onChange={(e) => set('from', e.target.value)}
        className="w-44"
      />
      <TextInput
        type="date"
        label="To"
        hint="…and on or before"
        value={period.to ?? ''}
        min={period.from}
        onChange={(e) => set('to', e.target.value)}
        className="w-44"
      />
      {children}
    </div>
  );
}

export function CsvLink({ href, label = 'Export CSV' }: { href: string; label?: string }) {
  return (
    <a href={href} download className={buttonClasses('secondary')}>
      {label}
    </a>
  );
}

/** DESIGN.md §4.3: the screen says plainly what the numbers can and cannot show. */
export function LeadNotProof() {
  return (
    <Notice tone="info" title="An association is a lead, not proof" className="mb-6">
      <p>
        A level with a high rate and a small q-value is worth checking first; it does not prove that level caused the
        contamination.
      </p>
      {/* The rest folds away so that, on a phone, the leads are not pushed below the first screen. */}
      <details className="mt-1">
        <summary className="cursor-pointer text-sm text-accent underline">Why the figures overstate certainty</summary>
        <p className="mt-1">
          Jars from one run or one culture are not independent, so the p- and q-values are too small and rank leads
          rather than measure certainty. Where two levels hold the same jars the data cannot tell them apart.
        </p>
      </details>
    </Notice>
  );
}

interface LoadStateProps {
  /** The screen's figures: its pending state, error and retry drive what is shown. */
  query: { isPending: boolean; error: unknown; refetch: () => Promise<unknown> };
  /** False while the query waits for a choice and is not sent: no spinner then. */
  asked?: boolean;
  isEmpty: boolean;
  emptyTitle: string;
  children: ReactNode;
}

/** Loading, failure and empty states shared by every analysis screen. */
export function LoadState({ query, asked = true, isEmpty, emptyTitle, children }: LoadStateProps) {
  const { error } = query;
  if (asked && query.isPending)
    return (
      <div className="flex justify-center py-16 text-accent">
        <Spinner label="Counting jars" size={32} />
      </div>
    );
  if (error) {
    return (
      <Notice tone="danger" title="The figures could not be loaded">
        <p role="alert">{errorMessage(error)}</p>
        <button type="button" className={cx(buttonClasses('secondary'), 'mt-3')} onClick={() => void query.refetch()}>
          Try again
        </button>
      </Notice>
    );
  }
  if (isEmpty) {
    return (
      <EmptyState icon="search" title={emptyTitle}>
        Choose a wider period, or record jars and incidents first.
      </EmptyState>
    );
  }
  return <>{children}</>;
}

interface TableProps {
  caption: string;
  children: ReactNode;
  className?: string;
  tableClassName?: string;
}

export function Table({ caption, children, className, tableClassName }: TableProps) {
  return (
    <div
      role="region"
      aria-label={caption}
      // A region that scrolls must take focus, so a keyboard can scroll it (WCAG 2.1.1).
      // eslint-disable-next-line jsx-a11y/no-noninteractive-tabindex -- a scrolling region must take keyboard focus
      tabIndex={0}
      // relative: screen-reader-only text in cells is absolutely placed and must not widen the page.
      className={cx('relative overflow-x-auto rounded-lg border-2 border-line bg-surface-raised', className)}
    >
      <table className={cx('w-full border-collapse text-left', tableClassName)}>
        <caption className="sr-only">{caption}</caption>
        {children}
      </table>
    </div>
  );
}

/** The pager under an analysis table, once there is more than the smallest page; it keeps its place in the URL. */
export function TablePager({ total, page, pageSize }: { total: number; page: number; pageSize: number }) {
  const [params, setParams] = useSearchParams();
  if (total <= pageSizes[0]) return null;
  return (
    <Pager page={page} pageSize={pageSize} total={total} onChange={(patch) => setParams(patchParams(params, patch))} />
  );
}

export const th = 'px-3 py-2 text-sm font-semibold whitespace-nowrap border-b-2 border-line';
export const td = 'px-3 py-2 border-t border-line align-top';
export const nowrap = 'whitespace-nowrap';
export const num = 'text-right tabular-nums';
