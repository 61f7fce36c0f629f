import { flexRender, type Header } from '@tanstack/react-table';
import { cx } from '../../../lib/cx';
import { Icon } from '../icon';

export function SortableHeader<T>({ header }: { header: Header<T, unknown> }) {
  const { column } = header;
  const label = header.isPlaceholder ? null : flexRender(column.columnDef.header, header.getContext());
  const direction = column.getIsSorted();
  const className = cx('px-3 py-2 text-sm font-semibold whitespace-nowrap text-ink', column.columnDef.meta?.className);

  if (!column.getCanSort()) {
    return (
      <th scope="col" className={cx(className, 'py-3 max-sm:hidden')}>
        {label}
      </th>
    );
  }
  return (
    <th
      scope="col"
      aria-sort={direction === 'asc' ? 'ascending' : direction === 'desc' ? 'descending' : undefined}
      className={className}
    >
      <button
        type="button"
        onClick={column.getToggleSortingHandler()}
        className="-mx-2 inline-flex min-h-touch items-center gap-1 rounded-md px-2 hover:bg-line"
      >
        {label}
        <span className={direction ? 'text-accent' : 'text-muted'}>
          <Icon name={direction === 'asc' ? 'sort-asc' : direction === 'desc' ? 'sort-desc' : 'sort-none'} size={16} />
        </span>
      </button>
    </th>
  );
}

export function SkeletonRows({ rows, columns }: { rows: number; columns: number }) {
  return (
    <>
      {Array.from({ length: rows }, (_, r) => (
        <tr key={r} className="border-t border-line max-sm:block">
          {Array.from({ length: columns }, (_, c) => (
            <td key={c} className="px-3 py-4 max-sm:block max-sm:py-2">
              <span className="block h-4 w-3/4 animate-pulse rounded bg-surface-sunken" />
            </td>
          ))}
        </tr>
      ))}
    </>
  );
}

/** A column heading, with its own classes where it differs from the others (such as a number column). */
export type PlainHeading = string | { label: string; className: string };

interface PlainTableHeadProps {
  headings: readonly PlainHeading[];
  /** The classes of every heading that does not bring its own. */
  cellClassName: string;
  rowClassName?: string;
}

/** The head row of a plain, unsorted table: one column heading per label. */
export function PlainTableHead({ headings, cellClassName, rowClassName }: PlainTableHeadProps) {
  return (
    <tr className={rowClassName}>
      {headings.map((heading) => {
        const { label, className } =
          typeof heading === 'string' ? { label: heading, className: cellClassName } : heading;
        return (
          <th key={label} scope="col" className={className}>
            {label}
          </th>
        );
      })}
    </tr>
  );
}
