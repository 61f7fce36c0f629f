import { useMutation, useQueryClient } from '@tanstack/react-query';
import { jarRowSchema } from '../../../../shared/schemas/jars';
import type { JarEventInput } from '../../../../shared/schemas/jar-events';
import { api } from '../../../lib/api-client';
import { jarsQueries } from './jars-queries';

export function useRecordJarEvent(jarId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: JarEventInput) => api.post(`/jars/${jarId}/events`, input, { schema: jarRowSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: jarsQueries.all }),
  });
}
