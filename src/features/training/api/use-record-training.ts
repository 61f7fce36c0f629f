import { useMutation, useQueryClient } from '@tanstack/react-query';
import { trainingRecordSchema, type CreateTrainingRecordInput } from '../../../../shared/schemas/training';
import { api } from '../../../lib/api-client';
import { trainingQueries } from './training-queries';

export function useRecordTraining() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateTrainingRecordInput) =>
      api.post('/training-records', input, { schema: trainingRecordSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: trainingQueries.all }),
  });
}
