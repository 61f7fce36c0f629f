import { useMutation, useQueryClient } from '@tanstack/react-query';
import {
  correctiveActionSchema,
  type CreateActionInput,
  type UpdateActionInput,
} from '../../../../shared/schemas/corrective-actions';
import { incidentDetailSchema } from '../../../../shared/schemas/incident-detail';
import type {
  AddIncidentPhotosInput,
  CreateIncidentInput,
  ReviewIncidentInput,
  UpdateIncidentInput,
  VoidIncidentInput,
} from '../../../../shared/schemas/incidents';
import { api } from '../../../lib/api-client';
import { incidentsQueries } from './incidents-queries';

function useIncidentMutation<I, O>(fn: (input: I) => Promise<O>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    // Jars change status with incidents, so their lists are refreshed too.
    onSuccess: async () => {
      await Promise.all([
        queryClient.invalidateQueries({ queryKey: incidentsQueries.all }),
        queryClient.invalidateQueries({ queryKey: ['jars'] }),
      ]);
    },
  });
}

export const useCreateIncident = () =>
  useIncidentMutation((input: CreateIncidentInput) => api.post('/incidents', input, { schema: incidentDetailSchema }));

export const useUpdateIncident = (id: number) =>
  useIncidentMutation((input: UpdateIncidentInput) =>
    api.patch(`/incidents/${id}`, input, { schema: incidentDetailSchema }),
  );

export const useReviewIncident = (id: number) =>
  useIncidentMutation((input: ReviewIncidentInput) =>
    api.post(`/incidents/${id}/review`, input, { schema: incidentDetailSchema }),
  );

export const useVoidIncident = (id: number) =>
  useIncidentMutation((input: VoidIncidentInput) =>
    api.post(`/incidents/${id}/void`, input, { schema: incidentDetailSchema }),
  );

export const useAddIncidentPhotos = (id: number) =>
  useIncidentMutation((input: AddIncidentPhotosInput) =>
    api.post(`/incidents/${id}/photos`, input, { schema: incidentDetailSchema }),
  );

export const useCreateAction = (incidentId: number) =>
  useIncidentMutation((input: CreateActionInput) =>
    api.post(`/incidents/${incidentId}/actions`, input, { schema: correctiveActionSchema }),
  );

export const useUpdateAction = () =>
  useIncidentMutation(({ id, ...input }: UpdateActionInput & { id: number }) =>
    api.patch(`/corrective-actions/${id}`, input, { schema: correctiveActionSchema }),
  );
