import { keepPreviousData, queryOptions } from '@tanstack/react-query';
import { pageOf } from '../../../../shared/schemas/common';
import { mailPreferencesSchema, sentMailDetailSchema, sentMailSchema } from '../../../../shared/schemas/mail';
import { api } from '../../../lib/api-client';

const sentPageSchema = pageOf(sentMailSchema);

export const mailQueries = {
  all: ['mail'] as const,
  preferences: () =>
    queryOptions({
      queryKey: [...mailQueries.all, 'preferences'] as const,
      queryFn: ({ signal }) => api.get('/mail/preferences', { signal, schema: mailPreferencesSchema }),
    }),
  sentLists: () => [...mailQueries.all, 'sent'] as const,
  sent: (page: number, pageSize: number) =>
    queryOptions({
      queryKey: [...mailQueries.sentLists(), { page, pageSize }] as const,
      queryFn: ({ signal }) => api.get('/mail/sent', { query: { page, pageSize }, signal, schema: sentPageSchema }),
      placeholderData: keepPreviousData,
    }),
  sentDetail: (id: number) =>
    queryOptions({
      queryKey: [...mailQueries.all, 'sent-detail', id] as const,
      queryFn: ({ signal }) => api.get(`/mail/sent/${id}`, { signal, schema: sentMailDetailSchema }),
    }),
};
