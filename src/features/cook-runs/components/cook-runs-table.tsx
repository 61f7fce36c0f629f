import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { Page } from '../../../../shared/schemas/common';
import type { CookRunDto } from '../../../../shared/schemas/cook-runs';
import { DataTable } from '../../../components/ui/table/data-table';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import type { TableState } from '../../../lib/list-params';
import { LethalityFigure } from './lethality-figure';

interface CookRunsTableProps extends TableState {
  data: Page<CookRunDto> | undefined;
  isLoading: boolean;
  isFetching: boolean;
  error: unknown;
  onRetry: () => void;
  onChange: (patch: Partial<TableState>) => void;
  empty: ReactNode;
}

const column = createColumnHelper<CookRunDto>();

const columns = [
  column.accessor('code', {
    header: 'Code',
    enableSorting: true,
    cell: ({ row: { original: run } }) => (
      <Link to={paths.cookRun.to(run.id)} className="font-medium text-accent underline-offset-2 hover:underline">
        {run.code}
      </Link>
    ),
  }),
  column.accessor('cookedOn', {
    header: 'Date',
    enableSorting: true,
    cell: ({ getValue }) => <span className="whitespace-nowrap">{getValue() ? formatDate(getValue()!) : '—'}</span>,
  }),
  column.accessor('container', { header: 'Container', enableSorting: true, cell: ({ getValue }) => getValue() ?? '—' }),
  column.accessor('minutesAtPressure', {
    header: 'Minutes at pressure',
    enableSorting: true,
    meta: { className: 'tabular-nums' },
  }),
  column.accessor('gaugeKPa', {
    header: 'Gauge',
    cell: ({ row: { original: run } }) =>
      run.gaugeKPa === null ? '—' : `${run.gaugeKPa.toFixed(1)} kPa (${run.gaugePsi?.toFixed(1)} psi)`,
  }),
  column.accessor('f0', {
    header: 'Lethality',
    enableSorting: true,
    cell: ({ row: { original: run } }) => <LethalityFigure run={run} />,
  }),
  column.accessor('operatorName', { header: 'Operator', cell: ({ getValue }) => getValue() ?? '—' }),
];

export function CookRunsTable({ data, ...table }: CookRunsTableProps) {
  return (
    <DataTable
      caption="Cook runs"
      columns={columns}
      data={data?.items}
      total={data?.total ?? 0}
      getRowId={(run) => String(run.id)}
      {...table}
    />
  );
}
