import { createColumnHelper } from '@tanstack/react-table';
import { useMemo } from 'react';
import type { UserDto } from '../../../../shared/schemas/users';
import { Badge } from '../../../components/ui/badge';
import { Button } from '../../../components/ui/button';
import { DateCell } from '../../../components/ui/table/cells';
import { roleLabels } from '../../../config/roles';

export interface UserActions {
  onEdit: (user: UserDto) => void;
  onResetPassword: (user: UserDto) => void;
  onToggleActive: (user: UserDto) => void;
}

const column = createColumnHelper<UserDto>();

export function useUserColumns({
  currentUserId,
  onEdit,
  onResetPassword,
  onToggleActive,
}: UserActions & { currentUserId: number }) {
  return useMemo(
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
        cell: ({ getValue }) => (
          <Badge tone={getValue() === 'admin' ? 'warn' : 'neutral'}>{roleLabels[getValue()]}</Badge>
        ),
      }),
      column.accessor('active', {
        header: 'Status',
        cell: ({ row: { original: user }, getValue }) => (
          <>
            {getValue() ? <Badge tone="ok">Active</Badge> : <Badge tone="neutral">Deactivated</Badge>}
            {user.mustChangePassword && <span className="block text-sm text-muted">Must set a new password</span>}
          </>
        ),
      }),
      column.accessor('createdAt', {
        header: 'Created',
        enableSorting: true,
        cell: ({ getValue }) => <DateCell value={getValue()} />,
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
              <Button variant="secondary" onClick={() => onEdit(user)}>
                Edit<span className="sr-only"> {user.displayName}</span>
              </Button>
              <Button variant="secondary" onClick={() => onResetPassword(user)}>
                Reset password<span className="sr-only"> of {user.displayName}</span>
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
    [currentUserId, onEdit, onResetPassword, onToggleActive],
  );
}
