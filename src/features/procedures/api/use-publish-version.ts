import { useMutation, useQueryClient } from '@tanstack/react-query';
import { procedureVersionSchema, type PublishVersionInput } from '../../../../shared/schemas/procedures';
import { api } from '../../../lib/api-client';
import { proceduresQueries } from './procedures-queries';

export function usePublishVersion(procedureId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: PublishVersionInput) =>
      api.post(`/procedures/${procedureId}/versions`, input, { schema: procedureVersionSchema }),
    // Every cached version's isCurrent flag may have changed.
    onSuccess: () => queryClient.invalidateQueries({ queryKey: proceduresQueries.all }),
  });
}
