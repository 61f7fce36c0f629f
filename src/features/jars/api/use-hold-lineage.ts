import { useMutation, useQueryClient } from '@tanstack/react-query';
import { holdResultSchema } from '../../../../shared/schemas/jar-lineage';
import { api } from '../../../lib/api-client';
import { jarsQueries } from './jars-queries';

export function useHoldLineage(kind: 'culture' | 'jar', id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (reason: string) => api.post(`/lineage/${kind}/${id}/hold`, { reason }, { schema: holdResultSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jarsQueries.all }),
  });
}
