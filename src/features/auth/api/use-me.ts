import { useQuery } from '@tanstack/react-query';
import type { MeDto } from '../../../../shared/schemas/auth';
import { authQueries } from './auth-queries';

export function useMe() {
  return useQuery(authQueries.me());
}

/** For screens behind the session guard, where a user is always present. */
export function useCurrentUser(): MeDto {
  const { data } = useMe();
  if (!data) throw new Error('useCurrentUser used outside the signed-in area');
  return data;
}
