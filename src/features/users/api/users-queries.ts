import { roleSchema, type Role } from '../../../../shared/enums';
import { pageOf } from '../../../../shared/schemas/common';
import { userSchema } from '../../../../shared/schemas/users';
import { readTableState, type TableState } from '../../../lib/list-params';
import { pagedListQuery } from '../../../lib/list-query';

export const userSortFields = ['username', 'displayName', 'role', 'createdAt'] as const;

export interface UserFilters extends TableState {
  role: Role | undefined;
  active: 'true' | 'false' | undefined;
  q: string | undefined;
}

/** The URL is the source of truth for the list; anything unreadable falls back to "no filter". */
export function readUserFilters(params: URLSearchParams): UserFilters {
  const role = roleSchema.safeParse(params.get('role'));
  const active = params.get('active');
  const q = params.get('q')?.trim();
  return {
    ...readTableState(params, userSortFields),
    role: role.success ? role.data : undefined,
    active: active === 'true' || active === 'false' ? active : undefined,
    q: q ? q.slice(0, 64) : undefined,
  };
}

const userPageSchema = pageOf(userSchema);

export const usersQueries = {
  all: ['users'] as const,
  lists: () => [...usersQueries.all, 'list'] as const,
  list: (filters: UserFilters) =>
    pagedListQuery([...usersQueries.lists(), filters] as const, '/users', userPageSchema, filters),
};
