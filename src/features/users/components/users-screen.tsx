import { useQuery } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import type { UserDto } from '../../../../shared/schemas/users';
import { RegisterScreen } from '../../../components/layouts/register-screen';
import { Button } from '../../../components/ui/button';
import { useListParams } from '../../../lib/use-list-params';
import { readUserFilters, usersQueries } from '../api/users-queries';
import { CreateUserDialog } from './create-user-dialog';
import { EditUserDialog } from './edit-user-dialog';
import { ResetPasswordDialog } from './reset-password-dialog';
import { SetActiveDialog } from './set-active-dialog';
import { useUserColumns } from './users-columns';
import { isUserFiltered, UsersFilters, usersCleared } from './users-filters';

type OpenDialog = { kind: 'create' } | { kind: 'edit' | 'reset' | 'active'; userId: number } | null;

export function UsersScreen({ currentUserId }: { currentUserId: number }) {
  const params = useListParams(readUserFilters);
  const { filters, update } = params;
  const list = useQuery(usersQueries.list(filters));
  const [dialog, setDialog] = useState<OpenDialog>(null);

  const selected =
    dialog && dialog.kind !== 'create' ? list.data?.items.find((u) => u.id === dialog.userId) : undefined;
  const close = useCallback(() => setDialog(null), []);
  const onEdit = useCallback((user: UserDto) => setDialog({ kind: 'edit', userId: user.id }), []);
  const onResetPassword = useCallback((user: UserDto) => setDialog({ kind: 'reset', userId: user.id }), []);
  const onToggleActive = useCallback((user: UserDto) => setDialog({ kind: 'active', userId: user.id }), []);
  const columns = useUserColumns({ currentUserId, onEdit, onResetPassword, onToggleActive });

  return (
    <RegisterScreen
      title="Users"
      description="Everyone who signs in to Asepta in this lab. Accounts are deactivated, never deleted, so every record keeps its author."
      actions={
        <Button icon="plus" onClick={() => setDialog({ kind: 'create' })}>
          New user
        </Button>
      }
      filters={<UsersFilters filters={filters} onChange={update} />}
      columns={columns}
      query={list}
      params={params}
      empty={{
        filtered: isUserFiltered(filters),
        none: 'No users yet.',
        noMatch: 'No users match these filters.',
        onClear: () => update(usersCleared),
      }}
    >
      <CreateUserDialog open={dialog?.kind === 'create'} onClose={close} />
      <EditUserDialog user={dialog?.kind === 'edit' ? selected : undefined} onClose={close} />
      <ResetPasswordDialog user={dialog?.kind === 'reset' ? selected : undefined} onClose={close} />
      <SetActiveDialog user={dialog?.kind === 'active' ? selected : undefined} onClose={close} />
    </RegisterScreen>
  );
}
