import { z } from 'zod';
import {
  dateRangeShape,
  listQueryOf,
  oneOperator,
  operatorShape,
  recordedDateSchema,
  recordedInstantSchema,
} from './common';
import { registerCodeSchema } from './grain';
import { f0Sources, logPlacements, type F0Source } from '../enums';

export const logPlacementSchema = z.enum(logPlacements, { error: 'must be chamber or centre' });
/** How the screen names where the logged probe sat. */
export const logPlacementLabels = { chamber: 'chamber probe', centre: 'probe at the jar centre' } as const;

/** How the screen names each source: the estimate ignores the lag of the jar centre behind the chamber. */
export const f0SourceLabels: Record<F0Source, string> = {
  log: 'from temperature log',
  estimate: 'estimated upper bound',
};

/** 15 psi gauge, the usual set-point of a pressure cooker (TRADE.md §1, common practice). */
export const defaultGaugeKPa = 103.4;

export const cookRunSchema = z.object({
  id: z.number().int(),
  code: z.string(),
  vessel: z.string().nullable(),
  startedAt: z.string().nullable(),
  cookedOn: z.string().nullable(),
  minutesAtPressure: z.number().int(),
  gaugeKPa: z.number().nullable(),
  gaugePsi: z.number().nullable(),
  ventingMinutes: z.number().int().nullable(),
  altitudeM: z.number().int(),
  container: z.string().nullable(),
  loadCount: z.number().int().nullable(),
  operatorId: z.number().int().nullable(),
  operatorName: z.string().nullable(),
  f0: z.number().nullable(),
  f0Source: z.enum(f0Sources).nullable(),
  f0Label: z.string().nullable(),
  /** Saturated-steam temperature at the gauge pressure (or 103.4 kPa when none was read) and site altitude. */
  sterilisingTemperatureC: z.number().nullable(),
  lethalityTarget: z.number(),
  logPlacement: logPlacementSchema.nullable(),
  /** centre-probe: F0 against the target; minutes: minutes at pressure against the container's minimum. */
  judgedBy: z.enum(['centre-probe', 'minutes', 'unjudged']),
  f0UpperBound: z.boolean(),
  minimumMinutes: z.number().int().nullable(),
  belowTarget: z.boolean(),
  /** Same as belowTarget; kept for clients that read the older name. */
  lowLethality: z.boolean(),
  notes: z.string().nullable(),
  createdAt: z.string(),
});
export type CookRunDto = z.infer<typeof cookRunSchema>;

export const cookRunDetailSchema = cookRunSchema.extend({ readingsCount: z.number().int() });
export type CookRunDetailDto = z.infer<typeof cookRunDetailSchema>;

const cookRunFields = {
  code: registerCodeSchema,
  vessel: z.string().trim().max(80).nullish(),
  startedAt: recordedInstantSchema.nullish(),
  cookedOn: recordedDateSchema.nullish(),
  minutesAtPressure: z.number().int('must be whole minutes').min(1, 'must be at least 1 minute').max(600),
  gaugeKPa: z.number().min(0, 'must not be negative').max(350, 'must be at most 350 kPa').nullish(),
  ventingMinutes: z.number().int('must be whole minutes').min(0).max(120).nullish(),
  altitudeM: z.number().int('must be whole metres').min(-500).max(5000),
  container: z.string().trim().min(1).max(40),
  loadCount: z.number().int().min(1).max(1000).nullish(),
  ...operatorShape,
  notes: z.string().trim().max(4000).nullish(),
};

export const createCookRunSchema = z
  .object({ ...cookRunFields, altitudeM: cookRunFields.altitudeM.default(0) })
  .refine((v) => v.cookedOn || v.startedAt, {
    path: ['cookedOn'],
    message: 'enter the date of the run or its start time',
  })
  .refine(...oneOperator);
export type CreateCookRunInput = z.input<typeof createCookRunSchema>;
export type CreateCookRunValues = z.output<typeof createCookRunSchema>;

export const updateCookRunSchema = z
  .object({ ...cookRunFields, reason: z.string().trim().max(500).optional() })
  .partial()
  .refine(...oneOperator);
export type UpdateCookRunInput = z.infer<typeof updateCookRunSchema>;

export const cookRunSortFields = ['code', 'cookedOn', 'minutesAtPressure', 'f0', 'container'] as const;

export const cookRunFiltersSchema = z.object({
  q: z.string().trim().max(80).optional(),
  container: z.string().trim().max(40).optional(),
  ...dateRangeShape,
  belowTarget: z.enum(['true', 'false']).optional(),
  /** The older name of belowTarget. */
  lowLethality: z.enum(['true', 'false']).optional(),
});
export const cookRunListQuerySchema = listQueryOf(cookRunFiltersSchema);
export type CookRunListQuery = z.infer<typeof cookRunListQuerySchema>;
export type CookRunFilters = z.infer<typeof cookRunFiltersSchema>;

export const cookRunReadingSchema = z.object({ minute: z.number(), celsius: z.number(), lethalRate: z.number() });
export type CookRunReadingDto = z.infer<typeof cookRunReadingSchema>;

export const cookRunReadingsSchema = z.object({
  cookRunId: z.number().int(),
  f0: z.number().nullable(),
  f0Source: z.enum(f0Sources).nullable(),
  logPlacement: logPlacementSchema.nullable(),
  readings: z.array(cookRunReadingSchema),
});
export type CookRunReadingsDto = z.infer<typeof cookRunReadingsSchema>;

export const readingsUploadQuerySchema = z.object({ placement: logPlacementSchema.default('chamber') });

/** Column names a temperature log may use, compared case-insensitively. */
export const readingMinuteHeaders = ['minute', 'minutes', 'elapsed_min'] as const;
export const readingCelsiusHeaders = ['celsius', 'temp_c', 'temperature'] as const;
