import { useMutation, useQueryClient } from '@tanstack/react-query';
import { agarTestSchema, type CreateAgarTestInput } from '../../../../shared/schemas/cultures';
import { api } from '../../../lib/api-client';
import { culturesQueries } from './cultures-queries';

export function useAddAgarTest(cultureId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateAgarTestInput) =>
      api.post(`/cultures/${cultureId}/agar-tests`, input, { schema: agarTestSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: culturesQueries.detail(cultureId).queryKey }),
  });
}
