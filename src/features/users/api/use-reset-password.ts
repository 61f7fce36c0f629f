import { useMutation, useQueryClient } from '@tanstack/react-query';
import { passwordResetSchema, type ResetPasswordInput } from '../../../../shared/schemas/users';
import { api } from '../../../lib/api-client';
import { usersQueries } from './users-queries';

export function useResetPassword() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, input }: { id: number; input: ResetPasswordInput }) =>
      api.post(`/users/${id}/password-reset`, input, { schema: passwordResetSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueries.lists() }),
  });
}
