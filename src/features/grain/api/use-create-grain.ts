import { useMutation, useQueryClient } from '@tanstack/react-query';
import { grainSchema, type CreateGrainInput } from '../../../../shared/schemas/grain';
import { api } from '../../../lib/api-client';
import { grainQueries } from './grain-queries';

export function useCreateGrain() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateGrainInput) => api.post('/grains', input, { schema: grainSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: grainQueries.grains().queryKey }),
  });
}
