import { useMutation, useQueryClient } from '@tanstack/react-query';
import { cultureDetailSchema, type ChangeCultureStateInput } from '../../../../shared/schemas/cultures';
import { api } from '../../../lib/api-client';
import { culturesQueries } from './cultures-queries';

export function useChangeCultureState(cultureId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ChangeCultureStateInput) =>
      api.post(`/cultures/${cultureId}/state`, input, { schema: cultureDetailSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: culturesQueries.all }),
  });
}
