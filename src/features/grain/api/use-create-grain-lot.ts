import { useMutation, useQueryClient } from '@tanstack/react-query';
import { grainLotSchema, type CreateGrainLotInput } from '../../../../shared/schemas/grain';
import { api } from '../../../lib/api-client';
import { grainQueries } from './grain-queries';

export function useCreateGrainLot() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateGrainLotInput) => api.post('/grain-lots', input, { schema: grainLotSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: grainQueries.all }),
  });
}
