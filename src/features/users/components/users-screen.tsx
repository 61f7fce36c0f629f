import { useQuery } from '@tanstack/react-query';
import { useCallback, useState } from 'react';
import { useSearchParams } from 'react-router';
import type { UserDto } from '../../../../shared/schemas/users';
import { Button } from '../../../components/ui/button';
import { EmptyState } from '../../../components/ui/empty-state';
import { PageHeader } from '../../../components/ui/page-header';
import { patchParams } from '../../../lib/list-params';
import { readUserFilters, usersQueries } from '../api/users-queries';
import { ChangeRoleDialog } from './change-role-dialog';
import { CreateUserDialog } from './create-user-dialog';
import { SetActiveDialog } from './set-active-dialog';
import { UsersFilters } from './users-filters';
import { UsersTable } from './users-table';

type OpenDialog = { kind: 'create' } | { kind: 'role' | 'active'; userId: number } | null;

export function UsersScreen({ currentUserId }: { currentUserId: number }) {
  const [searchParams, setSearchParams] = useSearchParams();
  const filters = readUserFilters(searchParams);
  const list = useQuery(usersQueries.list(filters));
  const [dialog, setDialog] = useState<OpenDialog>(null);

  const update = (patch: Record<string, string | number | undefined>) => setSearchParams(patchParams(searchParams, patch));
  const selected = dialog && dialog.kind !== 'create' ? list.data?.items.find((u) => u.id === dialog.userId) : undefined;
  const close = useCallback(() => setDialog(null), []);
  const onChangeRole = useCallback((user: UserDto) => setDialog({ kind: 'role', userId: user.id }), []);
  const onToggleActive = useCallback((user: UserDto) => setDialog({ kind: 'active', userId: user.id }), []);
  const filtered = Boolean(filters.role || filters.active || filters.q);

  return (
    <>
      <PageHeader
        title="Users"
        description="Everyone who signs in to Asepta in this lab. Accounts are deactivated, never deleted, so every record keeps its author."
        actions={
          <Button icon="plus" onClick={() => setDialog({ kind: 'create' })}>
            New user
          </Button>
        }
      />
      <UsersFilters filters={filters} onChange={update} />
      <UsersTable
        data={list.data}
        page={filters.page}
        pageSize={filters.pageSize}
        sort={filters.sort}
        onChange={update}
        currentUserId={currentUserId}
        isLoading={list.isPending}
        isFetching={list.isPlaceholderData}
        error={list.error}
        onRetry={() => void list.refetch()}
        onChangeRole={onChangeRole}
        onToggleActive={onToggleActive}
        empty={
          filtered ? (
            <EmptyState
              icon="search"
              title="No users match these filters."
              action={
                <Button variant="secondary" onClick={() => update({ role: undefined, active: undefined, q: undefined })}>
                  Clear filters
                </Button>
              }
            />
          ) : (
            <EmptyState title="No users yet." />
          )
        }
      />
      <CreateUserDialog open={dialog?.kind === 'create'} onClose={close} />
      <ChangeRoleDialog user={dialog?.kind === 'role' ? selected : undefined} onClose={close} />
      <SetActiveDialog user={dialog?.kind === 'active' ? selected : undefined} onClose={close} />
    </>
  );
}
