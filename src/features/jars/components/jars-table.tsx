import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { Page } from '../../../../shared/schemas/common';
import type { JarRowDto } from '../../../../shared/schemas/jars';
import { DataTable } from '../../../components/ui/table/data-table';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import type { TableState } from '../../../lib/list-params';
import { JarStatusBadge } from './jar-status-badge';

interface JarsTableProps extends TableState {
  data: Page<JarRowDto> | undefined;
  isLoading: boolean;
  isFetching: boolean;
  error: unknown;
  onRetry: () => void;
  onChange: (patch: Partial<TableState>) => void;
  empty: ReactNode;
}

const column = createColumnHelper<JarRowDto>();
const dash = (v: string | number | null) => (v === null || v === '' ? '—' : v);

const columns = [
  column.accessor('label', {
    header: 'Label',
    enableSorting: true,
    cell: ({ getValue }) => (
      <Link to={paths.jarPage.to(getValue())} className="font-medium text-accent underline-offset-2 hover:underline">
        {getValue()}
      </Link>
    ),
  }),
  column.accessor('status', {
    header: 'Status',
    enableSorting: true,
    cell: ({ getValue }) => <JarStatusBadge status={getValue()} />,
  }),
  column.accessor('grain', { header: 'Grain', enableSorting: true }),
  column.accessor('inoculatedOn', {
    header: 'Inoculated',
    enableSorting: true,
    cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDate(getValue())}</span>,
  }),
  column.display({
    id: 'inoculum',
    header: 'Inoculum',
    cell: ({ row: { original: j } }) => dash(j.cultureCode ?? (j.parentJarLabel ? `jar ${j.parentJarLabel}` : null)),
  }),
  column.accessor('sessionCode', { header: 'Session', cell: ({ getValue }) => dash(getValue()) }),
  column.accessor('cookRunCode', { header: 'Cook run', cell: ({ getValue }) => dash(getValue()) }),
  column.accessor('room', {
    header: 'Room / shelf',
    enableSorting: true,
    meta: { label: 'Room / shelf' },
    cell: ({ row: { original: j } }) =>
      j.room ? `${j.room} / ${j.shelf ?? '—'}${j.shelfPosition ? ` #${j.shelfPosition}` : ''}` : '—',
  }),
];

export function JarsTable({ data, ...table }: JarsTableProps) {
  return (
    <DataTable
      caption="Jars"
      columns={columns}
      data={data?.items}
      total={data?.total ?? 0}
      getRowId={(j) => String(j.id)}
      {...table}
    />
  );
}
