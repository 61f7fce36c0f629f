import { queryOptions } from '@tanstack/react-query';
import { z } from 'zod';
import { personSchema } from '../../../../shared/schemas/users';
import { api } from '../../../lib/api-client';

/** The lab's active people by name, for choosing an owner or a trainee. */
export const peopleQuery = () =>
  queryOptions({
    queryKey: ['users', 'people'] as const,
    queryFn: ({ signal }) => api.get('/users/people', { signal, schema: z.array(personSchema) }),
    staleTime: 60_000,
  });
