import type { UseQueryResult } from '@tanstack/react-query';
import type { ColumnDef } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import type { Page } from '../../../../shared/schemas/common';
import type { TableState } from '../../../lib/list-params';
import { DataTable } from './data-table';

export interface QueryTableProps<T> {
  caption: string;
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- column value types differ per column
  columns: ColumnDef<T, any>[];
  query: UseQueryResult<Page<T>>;
  state: TableState;
  onChange: (patch: Partial<TableState>) => void;
  empty: ReactNode;
}

/** A DataTable fed by one paged query; rows are keyed by their id. */
export function QueryTable<T extends { id: number }>({
  caption,
  columns,
  query,
  state,
  onChange,
  empty,
}: QueryTableProps<T>) {
  return (
    <DataTable
      caption={caption}
      columns={columns}
      data={query.data?.items}
      total={query.data?.total ?? 0}
      totalCapped={query.data?.totalCapped}
      getRowId={(row) => String(row.id)}
      page={state.page}
      pageSize={state.pageSize}
      sort={state.sort}
      onChange={onChange}
      isLoading={query.isPending}
      isFetching={query.isPlaceholderData}
      error={query.error}
      onRetry={() => void query.refetch()}
      empty={empty}
    />
  );
}
