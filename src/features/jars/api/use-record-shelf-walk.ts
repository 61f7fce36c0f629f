import { useMutation, useQueryClient } from '@tanstack/react-query';
import { shelfWalkResultSchema, type ShelfWalkInput } from '../../../../shared/schemas/jars';
import { api } from '../../../lib/api-client';
import { jarsQueries } from './jars-queries';

export function useRecordShelfWalk() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ShelfWalkInput) => api.post('/jars/shelf-walk', input, { schema: shelfWalkResultSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jarsQueries.all }),
  });
}
