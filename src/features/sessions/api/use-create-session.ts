import { useMutation, useQueryClient } from '@tanstack/react-query';
import { sessionDetailSchema, type CreateSessionInput } from '../../../../shared/schemas/sessions';
import { api } from '../../../lib/api-client';
import { sessionsQueries } from './sessions-queries';

export function useCreateSession() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: CreateSessionInput) => api.post('/sessions', input, { schema: sessionDetailSchema }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: sessionsQueries.lists() }),
  });
}
