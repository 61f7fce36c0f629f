import { useMutation, useQueryClient } from '@tanstack/react-query';
import { userSchema, type CreateUserInput } from '../../../../shared/schemas/users';
import { api } from '../../../lib/api-client';
import { usersQueries } from './users-queries';

export function useCreateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateUserInput) => api.post('/users', input, { schema: userSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueries.lists() }),
  });
}
