import { createColumnHelper } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import { Link } from 'react-router';
import type { Page } from '../../../../shared/schemas/common';
import { workspaceLabels, type SessionDto } from '../../../../shared/schemas/sessions';
import { DataTable } from '../../../components/ui/table/data-table';
import { paths } from '../../../config/paths';
import { formatDate } from '../../../lib/format';
import type { TableState } from '../../../lib/list-params';

interface Props extends TableState {
  data: Page<SessionDto> | undefined;
  isLoading: boolean;
  isFetching: boolean;
  error: unknown;
  onRetry: () => void;
  onChange: (patch: Partial<TableState>) => void;
  empty: ReactNode;
}

const column = createColumnHelper<SessionDto>();

const columns = [
  column.accessor('code', {
    header: 'Code',
    enableSorting: true,
    cell: ({ row: { original: s } }) => (
      <Link to={paths.session.to(s.id)} className="font-medium text-accent underline-offset-2 hover:underline">
        {s.code}
      </Link>
    ),
  }),
  column.accessor('heldOn', {
    header: 'Date',
    enableSorting: true,
    cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDate(getValue())}</span>,
  }),
  column.accessor('operatorName', {
    id: 'operator',
    header: 'Operator',
    enableSorting: true,
    cell: ({ getValue }) => getValue() ?? '—',
  }),
  column.accessor('workspace', {
    header: 'Workspace',
    cell: ({ getValue }) => (getValue() ? workspaceLabels[getValue()!] : '—'),
  }),
  column.accessor('procedureVersionId', {
    header: 'Checklist',
    cell: ({ getValue }) => (getValue() ? 'Procedure followed' : <span className="text-muted">none</span>),
  }),
];

export function SessionsTable({ data, ...table }: Props) {
  return (
    <DataTable
      caption="Inoculation sessions"
      columns={columns}
      data={data?.items}
      total={data?.total ?? 0}
      getRowId={(s) => String(s.id)}
      {...table}
    />
  );
}
