import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type UpdateUserInput } from '../../../../shared/schemas/users';
import { api } from '../../../lib/api-client';
import { usersQueries } from './users-queries';

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: UpdateUserInput }) =>
      api.patch(`/users/${id}`, input, { schema: userSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueries.lists() }),
  });
}
