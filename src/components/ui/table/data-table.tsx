import {
  flexRender,
  getCoreRowModel,
  useReactTable,
  type ColumnDef,
  type RowData,
  type SortingState,
  type Updater,
} from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { cx } from '../../../lib/cx';
import type { TableState } from '../../../lib/list-params';
import { Button } from '../button';
import { EmptyState } from '../empty-state';
import { LoadFailed } from '../load-failed';
import { Pager } from './pager';
import { SkeletonRows, SortableHeader } from './table-parts';

declare module '@tanstack/react-table' {
  // eslint-disable-next-line @typescript-eslint/no-unused-vars -- the merged interface must repeat the library's type parameters
  interface ColumnMeta<TData extends RowData, TValue> {
    className?: string;
    /** Label shown beside the value in the phone layout, when the header is not plain text. */
    label?: string;
  }
}

const toSorting = (sort: string | undefined): SortingState =>
  sort ? [{ id: sort.replace(/^-/, ''), desc: sort.startsWith('-') }] : [];

const fromSorting = (sorting: SortingState): string | undefined => {
  const first = sorting[0];
  return first ? `${first.desc ? '-' : ''}${first.id}` : undefined;
};

// On phones each row becomes a card: cells stack, each led by its column's name.
const cellClasses = cx(
  'px-3 py-3 align-middle',
  'max-sm:flex max-sm:items-start max-sm:justify-between max-sm:gap-4 max-sm:py-1.5 max-sm:text-right',
  'max-sm:before:shrink-0 max-sm:before:text-left max-sm:before:font-medium max-sm:before:text-muted max-sm:before:content-[attr(data-label)]',
);

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- any column of any row type
const cellLabel = (def: ColumnDef<any, any>) =>
  def.meta?.label ?? (typeof def.header === 'string' ? def.header : undefined);

interface DataTableProps<T> extends TableState {
  /** Names the table for screen readers. */
  caption: string;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- column value types differ per column
  columns: ColumnDef<T, any>[];
  data: T[] | undefined;
  total: number;
  /** The server stopped counting at `total`. */
  totalCapped?: boolean;
  onChange: (patch: Partial<TableState>) => void;
  getRowId: (row: T) => string;
  isLoading?: boolean;
  /** A newer page is on its way while the old one shows. */
  isFetching?: boolean;
  error?: unknown;
  onRetry?: () => void;
  empty: ReactNode;
}

/** Sorting and paging happen on the server; columns opt into sorting with `enableSorting: true`. */
export function DataTable<T>(props: DataTableProps<T>) {
  const { caption, columns, data, total, page, pageSize, sort, onChange, isLoading, isFetching, error, onRetry } =
    props;
  const sorting = toSorting(sort);
  const table = useReactTable({
    data: data ?? [],
    columns,
    getRowId: props.getRowId,
    getCoreRowModel: getCoreRowModel(),
    manualPagination: true,
    manualSorting: true,
    rowCount: total,
    enableMultiSort: false,
    enableSortingRemoval: false,
    sortDescFirst: false,
    defaultColumn: { enableSorting: false },
    state: { sorting, pagination: { pageIndex: page - 1, pageSize } },
    onSortingChange: (updater: Updater<SortingState>) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      onChange({ sort: fromSorting(next), page: 1 });
    },
  });

  if (error && !data) return <LoadFailed title="The list could not be loaded." error={error} onRetry={onRetry} />;

  const columnCount = table.getVisibleLeafColumns().length;
  const rows = table.getRowModel().rows;

  return (
    <div className="overflow-hidden rounded-lg border border-line bg-surface-raised">
      {/* relative: screen-reader-only text in cells is absolutely placed and must not widen the page.
          tabIndex: a scrollable region must be reachable by keyboard to scroll it. */}
      {/* eslint-disable-next-line jsx-a11y/no-noninteractive-tabindex -- a scrolling region must take keyboard focus */}
      <div className="relative overflow-x-auto" role="region" aria-label={caption} tabIndex={0}>
        <table
          aria-busy={isLoading || isFetching || undefined}
          className={cx('w-full border-collapse text-left max-sm:block', isFetching && 'opacity-70')}
        >
          <caption className="sr-only">{caption}</caption>
          <thead className="bg-surface-sunken max-sm:block">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id} className="max-sm:flex max-sm:flex-wrap max-sm:gap-x-3 max-sm:px-3">
                {group.headers.map((header) => (
                  <SortableHeader key={header.id} header={header} />
                ))}
              </tr>
            ))}
          </thead>
          <tbody className="max-sm:block">
            {isLoading && !data ? (
              <SkeletonRows rows={Math.min(pageSize, 6)} columns={columnCount} />
            ) : rows.length === 0 ? (
              <tr>
                <td colSpan={columnCount}>
                  {page > 1 && total > 0 ? (
                    <EmptyState
                      title="This page is past the end of the list."
                      action={
                        <Button variant="secondary" onClick={() => onChange({ page: 1 })}>
                          Go to the first page
                        </Button>
                      }
                    />
                  ) : (
                    props.empty
                  )}
                </td>
              </tr>
            ) : (
              rows.map((row) => (
                <tr key={row.id} className="border-t border-line hover:bg-surface max-sm:block max-sm:py-2">
                  {row.getVisibleCells().map((cell) => (
                    <td
                      key={cell.id}
                      data-label={cellLabel(cell.column.columnDef)}
                      className={cx(cellClasses, cell.column.columnDef.meta?.className)}
                    >
                      <div className="min-w-0">{flexRender(cell.column.columnDef.cell, cell.getContext())}</div>
                    </td>
                  ))}
                </tr>
              ))
            )}
          </tbody>
        </table>
      </div>
      {data ? (
        <Pager page={page} pageSize={pageSize} total={total} totalCapped={props.totalCapped} onChange={onChange} />
      ) : (
        <p role="status" className="border-t border-line px-4 py-3 text-muted">
          Loading…
        </p>
      )}
    </div>
  );
}
