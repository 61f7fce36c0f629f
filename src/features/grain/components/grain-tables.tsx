import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import type { Page } from '../../../../shared/schemas/common';
import type { GrainLotDto, PrepBatchDto } from '../../../../shared/schemas/grain';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/table/data-table';
import { formatDate } from '../../../lib/format';
import type { TableState } from '../../../lib/list-params';

interface TableProps<T> extends TableState {
  data: Page<T> | undefined;
  isLoading: boolean;
  isFetching: boolean;
  error: unknown;
  onRetry: () => void;
  onChange: (patch: Partial<TableState>) => void;
  empty: ReactNode;
}

const lot = createColumnHelper<GrainLotDto>();
const batch = createColumnHelper<PrepBatchDto>();
const orDash = (v: number | null, unit: string) => (v === null ? '—' : `${v} ${unit}`);

export function GrainLotsTable({
  data,
  onShowBatches,
  ...table
}: TableProps<GrainLotDto> & { onShowBatches: (lot: GrainLotDto) => void }) {
  const columns = [
    lot.accessor('supplierLotCode', {
      header: 'Supplier lot',
      enableSorting: true,
      cell: ({ getValue }) => <span className="font-medium">{getValue()}</span>,
    }),
    lot.accessor('grain', { header: 'Grain' }),
    lot.accessor('receivedOn', {
      header: 'Received',
      enableSorting: true,
      cell: ({ getValue }) => formatDate(getValue()),
    }),
    lot.accessor('prepBatchCount', {
      header: 'Prep batches',
      cell: ({ row: { original }, getValue }) => (
        <Button variant="ghost" onClick={() => onShowBatches(original)}>
          {getValue()}
          <span className="sr-only"> prep batches of lot {original.supplierLotCode}: show them</span>
        </Button>
      ),
    }),
    lot.accessor('notes', { header: 'Notes', cell: ({ getValue }) => getValue() ?? '' }),
  ];
  return (
    <DataTable
      caption="Grain lots"
      columns={columns}
      data={data?.items}
      total={data?.total ?? 0}
      totalCapped={data?.totalCapped}
      getRowId={(l) => String(l.id)}
      {...table}
    />
  );
}

const batchColumns = [
  batch.accessor('code', {
    header: 'Code',
    enableSorting: true,
    cell: ({ getValue }) => <span className="font-medium">{getValue()}</span>,
  }),
  batch.accessor('grain', {
    header: 'Grain lot',
    cell: ({ row: { original } }) => (
      <>
        {original.grain}
        <span className="block text-sm text-muted">{original.supplierLotCode}</span>
      </>
    ),
  }),
  batch.accessor('preparedOn', {
    header: 'Prepared',
    enableSorting: true,
    cell: ({ getValue }) => formatDate(getValue()),
  }),
  batch.accessor('soakHours', { header: 'Soak', cell: ({ getValue }) => orDash(getValue(), 'h') }),
  batch.accessor('simmerMinutes', { header: 'Simmer', cell: ({ getValue }) => orDash(getValue(), 'min') }),
  batch.accessor('drainMinutes', { header: 'Drain / dry', cell: ({ getValue }) => orDash(getValue(), 'min') }),
  batch.accessor('notes', { header: 'Notes', cell: ({ getValue }) => getValue() ?? '' }),
];

export function PrepBatchesTable({ data, ...table }: TableProps<PrepBatchDto>) {
  return (
    <DataTable
      caption="Prep batches"
      columns={batchColumns}
      data={data?.items}
      total={data?.total ?? 0}
      totalCapped={data?.totalCapped}
      getRowId={(b) => String(b.id)}
      {...table}
    />
  );
}
