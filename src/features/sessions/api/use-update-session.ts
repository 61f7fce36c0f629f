import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sessionDetailSchema, type UpdateSessionInput } from '../../../../shared/schemas/sessions';
import { api } from '../../../lib/api-client';
import { sessionsQueries } from './sessions-queries';

export function useUpdateSession(sessionId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: UpdateSessionInput) =>
      api.patch(`/sessions/${sessionId}`, input, { schema: sessionDetailSchema }),
    onSuccess: (session) => {
      queryClient.setQueryData(sessionsQueries.detail(sessionId).queryKey, session);
      return queryClient.invalidateQueries({ queryKey: sessionsQueries.lists() });
    },
  });
}
