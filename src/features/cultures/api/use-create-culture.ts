import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cultureDetailSchema, type CreateCultureInput } from '../../../../shared/schemas/cultures';
import { api } from '../../../lib/api-client';
import { culturesQueries } from './cultures-queries';

export function useCreateCulture() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateCultureInput) => api.post('/cultures', input, { schema: cultureDetailSchema }),
    // A new child shows on its parent's page too.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: culturesQueries.all }),
  });
}
