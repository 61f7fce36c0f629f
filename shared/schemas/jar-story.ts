import { z } from 'zod';
import { f0Sources } from '../enums';
import { jarEventSchema } from './jar-events';
import { jarNodeFields } from './jar-lineage';
import { jarRowSchema } from './jars';

const cultureSummary = z.object({
  id: z.number().int(),
  code: z.string(),
  species: z.string().nullable(),
  strain: z.string().nullable(),
  state: z.string(),
  generation: z.number().int().nullable(),
  preparedOn: z.string().nullable(),
});
export type CultureSummaryDto = z.infer<typeof cultureSummary>;

export const ancestorSchema = z.discriminatedUnion('kind', [
  z.object(jarNodeFields),
  z.object({ kind: z.literal('culture'), ...cultureSummary.shape }),
]);
export type AncestorDto = z.infer<typeof ancestorSchema>;

export const timelineKinds = [
  'grain-prep',
  'cook-run',
  'culture',
  'session',
  'inoculated',
  'event',
  'incident',
  'photo',
] as const;
export const timelineEntrySchema = z.object({
  at: z.string(),
  kind: z.enum(timelineKinds),
  title: z.string(),
  detail: z.string().nullable(),
  ref: z.number().int().nullable(),
});
export type TimelineEntryDto = z.infer<typeof timelineEntrySchema>;

export const jarStorySchema = z.object({
  jar: jarRowSchema,
  grainLot: z.object({ id: z.number().int(), supplierLotCode: z.string(), receivedOn: z.string() }).nullable(),
  prepBatch: z
    .object({
      id: z.number().int(),
      code: z.string(),
      preparedOn: z.string(),
      soakHours: z.number().nullable(),
      simmerMinutes: z.number().nullable(),
      drainMinutes: z.number().nullable(),
      notes: z.string().nullable(),
    })
    .nullable(),
  cookRun: z
    .object({
      id: z.number().int(),
      code: z.string(),
      cookedOn: z.string().nullable(),
      startedAt: z.string().nullable(),
      vessel: z.string().nullable(),
      minutesAtPressure: z.number(),
      gaugeKPa: z.number().nullable(),
      container: z.string().nullable(),
      f0: z.number().nullable(),
      f0Source: z.enum(f0Sources).nullable(),
      logPlacement: z.enum(['chamber', 'centre']).nullable(),
    })
    .nullable(),
  session: z
    .object({
      id: z.number().int(),
      code: z.string(),
      heldOn: z.string(),
      startedAt: z.string().nullable(),
      operatorName: z.string().nullable(),
      workspace: z.string().nullable(),
    })
    .nullable(),
  ancestry: z.array(ancestorSchema),
  events: z.array(jarEventSchema),
  incidents: z.array(
    z.object({
      id: z.number().int(),
      foundAt: z.string(),
      foundOn: z.string(),
      foundByName: z.string(),
      stage: z.string(),
      contaminant: z.string(),
      status: z.string(),
      verdict: z.string(),
      voided: z.boolean(),
    }),
  ),
  photos: z.array(
    z.object({
      id: z.number().int(),
      mime: z.string(),
      createdAt: z.string(),
      source: z.enum(['check', 'incident']),
      sourceId: z.number().int(),
    }),
  ),
  timeline: z.array(timelineEntrySchema),
  pageUrl: z.string(),
});
export type JarStoryDto = z.infer<typeof jarStorySchema>;
