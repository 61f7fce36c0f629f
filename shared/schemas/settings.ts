import { z } from 'zod';

export const cookBucketEdgesSchema = z
  .array(
    z
      .number()
      .int('must be whole minutes')
      .min(1, 'must be at least 1 minute')
      .max(1440, 'must be at most 1440 minutes'),
  )
  .min(1, 'give at least one edge')
  .max(10, 'give at most 10 edges')
  .refine((edges) => edges.every((e, i) => i === 0 || e > (edges[i - 1] ?? 0)), 'must be strictly increasing');

/** Container name → least whole minutes at pressure for a run without a centre-probe log. */
export const containerMinutesSchema = z
  .record(
    z.string().trim().min(1, 'name the container').max(40, 'a container name has at most 40 characters'),
    z.number().int('must be whole minutes').min(1, 'must be at least 1 minute').max(600, 'must be at most 600 minutes'),
  )
  .refine((m) => Object.keys(m).length <= 20, 'give at most 20 containers');

export const labSettingsSchema = z.object({
  cookBucketEdges: cookBucketEdgesSchema,
  lethalityTarget: z.number().positive('must be above 0').max(1000, 'must be at most 1000 minutes'),
  containerMinutes: containerMinutesSchema,
  contaminationTarget: z.number().min(0, 'must not be negative').max(1, 'must be at most 100 %'),
  observationWindowDays: z.number().int('must be whole days').min(1).max(180),
  clusterIncidents: z.number().int('must be a whole number').min(2).max(1000),
  clusterDays: z.number().int('must be whole days').min(1).max(365),
});

export const updateLabSettingsSchema = labSettingsSchema
  .partial()
  .strict()
  .refine((v) => Object.keys(v).length > 0, 'change at least one setting');
export type UpdateLabSettingsInput = z.infer<typeof updateLabSettingsSchema>;

/** timeZone is the lab's IANA zone (LAB_TIME_ZONE), read-only here: dates and "today" follow it. */
export type LabSettingsDto = z.infer<typeof labSettingsSchema> & { updatedAt: string; timeZone: string };

/** Bucket labels from the edges: 60, 90 → `<60`, `60-89`, `90+`. */
export function cookBucketLabels(edges: readonly number[]): string[] {
  if (edges.length === 0) return [];
  const labels = [`<${edges[0]}`];
  for (let i = 0; i + 1 < edges.length; i++) labels.push(`${edges[i]}-${(edges[i + 1] ?? 0) - 1}`);
  labels.push(`${edges[edges.length - 1]}+`);
  return labels;
}
