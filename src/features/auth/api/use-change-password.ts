import { useMutation } from '@tanstack/react-query';
import type { ChangePasswordInput } from '../../../../shared/schemas/auth';
import { api } from '../../../lib/api-client';

export function useChangePassword() {
  return useMutation({
    mutationFn: (input: ChangePasswordInput) => api.post('/auth/password', input),
  });
}
