import { useMutation, useQueryClient } from '@tanstack/react-query';
import { retrainRequestSchema, type CreateRetrainRequestInput } from '../../../../shared/schemas/training';
import { api } from '../../../lib/api-client';
import { trainingQueries } from './training-queries';

export function useRequestRetraining() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateRetrainRequestInput) =>
      api.post('/training/retrain-requests', input, { schema: retrainRequestSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trainingQueries.all }),
  });
}
