import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { Page } from '../../../../shared/schemas/common';
import type { CultureDto } from '../../../../shared/schemas/cultures';
import { DataTable } from '../../../components/ui/table/data-table';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import type { TableState } from '../../../lib/list-params';
import { CultureStateBadge } from './culture-state-badge';

interface Props extends TableState {
  data: Page<CultureDto> | undefined;
  isLoading: boolean;
  isFetching: boolean;
  error: unknown;
  onRetry: () => void;
  onChange: (patch: Partial<TableState>) => void;
  empty: ReactNode;
}

const column = createColumnHelper<CultureDto>();

const columns = [
  column.accessor('code', {
    header: 'Code',
    enableSorting: true,
    cell: ({ row: { original: c } }) => (
      <Link to={paths.culture.to(c.id)} className="font-medium text-accent underline-offset-2 hover:underline">
        {c.code}
      </Link>
    ),
  }),
  column.accessor('species', {
    header: 'Species',
    enableSorting: true,
    cell: ({ row: { original: c } }) => (
      <>
        <span className="italic">{c.species ?? '—'}</span>
        {c.strain && <span className="block text-sm text-muted">{c.strain}</span>}
      </>
    ),
  }),
  column.accessor('preparedOn', {
    header: 'Prepared',
    enableSorting: true,
    cell: ({ getValue }) => <span className="whitespace-nowrap">{getValue() ? formatDate(getValue()!) : '—'}</span>,
  }),
  column.accessor('generation', { header: 'Generation', cell: ({ getValue }) => getValue() ?? '—' }),
  column.accessor('parentCode', { header: 'Parent', cell: ({ getValue }) => getValue() ?? '—' }),
  column.accessor('state', {
    header: 'State',
    enableSorting: true,
    cell: ({ getValue }) => <CultureStateBadge state={getValue()} />,
  }),
];

export function CulturesTable({ data, ...table }: Props) {
  return (
    <DataTable
      caption="Cultures"
      columns={columns}
      data={data?.items}
      total={data?.total ?? 0}
      getRowId={(c) => String(c.id)}
      {...table}
    />
  );
}
