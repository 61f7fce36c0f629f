import { createColumnHelper } from '@tanstack/react-table';
import { useMemo, type ReactNode } from 'react';
import type { Page } from '../../../../shared/schemas/common';
import type { UserDto } from '../../../../shared/schemas/users';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { DataTable } from '../../../components/ui/table/data-table';
import { roleLabels } from '../../../config/roles';
import { formatDate } from '../../../lib/format';
import type { TableState } from '../../../lib/list-params';

export interface UserActions {
  onChangeRole: (user: UserDto) => void;
  onToggleActive: (user: UserDto) => void;
}

interface UsersTableProps extends TableState, UserActions {
  data: Page<UserDto> | undefined;
  currentUserId: number;
  isLoading: boolean;
  isFetching: boolean;
  error: unknown;
  onRetry: () => void;
  onChange: (patch: Partial<TableState>) => void;
  empty: ReactNode;
}

const column = createColumnHelper<UserDto>();

export function UsersTable({ data, currentUserId, onChangeRole, onToggleActive, ...table }: UsersTableProps) {
  const columns = useMemo(
    () => [
      column.accessor('displayName', {
        header: 'Name',
        enableSorting: true,
        meta: { className: 'min-w-48' },
        cell: ({ row: { original: user }, getValue }) => (
          <>
            <span className="font-medium">{getValue()}</span>
            {user.id === currentUserId && (
              <Badge tone="accent" className="ml-2">
                You
              </Badge>
            )}
            <span className="block text-sm break-all text-muted">{user.email ?? 'No e-mail on record'}</span>
          </>
        ),
      }),
      column.accessor('username', { header: 'Username', enableSorting: true }),
      column.accessor('role', {
        header: 'Role',
        enableSorting: true,
        cell: ({ getValue }) => <Badge tone={getValue() === 'admin' ? 'warn' : 'neutral'}>{roleLabels[getValue()]}</Badge>,
      }),
      column.accessor('active', {
        header: 'Status',
        cell: ({ getValue }) =>
          getValue() ? <Badge tone="ok">Active</Badge> : <Badge tone="neutral">Deactivated</Badge>,
      }),
      column.accessor('createdAt', {
        header: 'Created',
        enableSorting: true,
        cell: ({ getValue }) => <span className="whitespace-nowrap">{formatDate(getValue())}</span>,
      }),
      column.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        meta: { className: 'text-right max-sm:justify-end max-sm:pt-3' },
        cell: ({ row: { original: user } }) =>
          user.id === currentUserId ? (
            <span className="text-sm text-muted">Your own account</span>
          ) : (
            <span className="no-print flex justify-end gap-2 whitespace-nowrap">
              <Button variant="secondary" onClick={() => onChangeRole(user)}>
                Change role<span className="sr-only"> of {user.displayName}</span>
              </Button>
              <Button
                variant={user.active ? 'ghost' : 'secondary'}
                onClick={() => onToggleActive(user)}
                className={user.active ? 'text-danger hover:bg-danger-soft' : undefined}
              >
                {user.active ? 'Deactivate' : 'Reactivate'}
                <span className="sr-only"> {user.displayName}</span>
              </Button>
            </span>
          ),
      }),
    ],
    [currentUserId, onChangeRole, onToggleActive],
  );

  return (
    <DataTable
      caption="Users"
      columns={columns}
      data={data?.items}
      total={data?.total ?? 0}
      getRowId={(user) => String(user.id)}
      {...table}
    />
  );
}
