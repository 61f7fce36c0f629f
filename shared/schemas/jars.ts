import { z } from 'zod';
import { f0Sources, jarStatusSchema, jarStatuses, releasedToSchema, type JarStatus } from '../enums';
import { dateRangeShape, idSchema, pageQuerySchema, recordedInstantSchema } from './common';

/** Statuses a jar leaves the lab's hands in: no further events. */
export const endedStatuses: readonly JarStatus[] = ['discarded', 'released'];

const place = z.string().trim().min(1, 'enter a name').max(40, 'use at most 40 characters');
const optionalPlace = place.optional();
const note = z.string().trim().max(2000, 'use at most 2000 characters');
const reason = z
  .string()
  .trim()
  .min(3, 'give a reason of at least 3 characters')
  .max(500, 'use at most 500 characters');
const instant = recordedInstantSchema.transform((v) => new Date(v));
/** Lets the client send '' from an empty input. */
const optionalId = z.preprocess((v) => (v === '' || v === null ? undefined : v), idSchema.optional());

export const createJarBatchSchema = z
  .object({
    sessionId: idSchema,
    count: z.coerce
      .number()
      .int('must be a whole number')
      .min(1, 'make at least 1 jar')
      .max(200, 'make at most 200 jars at once'),
    grainId: optionalId,
    prepBatchId: optionalId,
    cookRunId: optionalId,
    cultureId: optionalId,
    parentJarId: optionalId,
    inoculumMl: z.preprocess(
      (v) => (v === '' || v === null ? undefined : v),
      z.coerce.number().positive('must be more than 0').max(1000, 'must be at most 1000 ml').optional(),
    ),
    room: optionalPlace,
    shelf: optionalPlace,
    inoculatedAt: instant.optional(),
  })
  .superRefine((v, ctx) => {
    if (v.cultureId === undefined && v.parentJarId === undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['cultureId'],
        message: 'choose the culture or the parent jar the jars were inoculated from',
      });
    }
    if (v.cultureId !== undefined && v.parentJarId !== undefined) {
      ctx.addIssue({
        code: 'custom',
        path: ['parentJarId'],
        message: 'a jar is inoculated from a culture or a parent jar, not both',
      });
    }
    if (v.grainId === undefined && v.prepBatchId === undefined) {
      ctx.addIssue({ code: 'custom', path: ['grainId'], message: 'choose the grain or the prep batch' });
    }
    if ((v.room === undefined) !== (v.shelf === undefined)) {
      ctx.addIssue({
        code: 'custom',
        path: [v.room === undefined ? 'room' : 'shelf'],
        message: 'give both room and shelf, or neither',
      });
    }
  });
export type CreateJarBatchInput = z.infer<typeof createJarBatchSchema>;
/** What a form holds before parsing: times still as text. */
export type CreateJarBatchFields = z.input<typeof createJarBatchSchema>;

const statusList = z
  .string()
  .transform((s) =>
    s
      .split(',')
      .map((x) => x.trim())
      .filter(Boolean),
  )
  .pipe(z.array(jarStatusSchema).min(1, `use one or more of ${jarStatuses.join(', ')}`));

export const jarSortFields = ['label', 'inoculatedOn', 'status', 'grain', 'room'] as const;

export const jarListQuerySchema = pageQuerySchema.extend({
  status: statusList.optional(),
  grainId: optionalId,
  cookRunId: optionalId,
  sessionId: optionalId,
  cultureId: optionalId,
  room: optionalPlace,
  shelf: optionalPlace,
  q: z.string().trim().max(40).optional(),
  ...dateRangeShape,
});
export type JarListQuery = z.infer<typeof jarListQuerySchema>;
export type JarFilters = Omit<JarListQuery, 'page' | 'pageSize' | 'sort'>;
export const jarExportQuerySchema = jarListQuerySchema.omit({ page: true, pageSize: true });
export type JarExportQuery = z.infer<typeof jarExportQuerySchema>;

export const jarRowSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  status: jarStatusSchema,
  grainId: z.number().int(),
  grain: z.string(),
  prepBatchId: z.number().int().nullable(),
  prepBatchCode: z.string().nullable(),
  cookRunId: z.number().int().nullable(),
  cookRunCode: z.string().nullable(),
  sessionId: z.number().int().nullable(),
  sessionCode: z.string().nullable(),
  cultureId: z.number().int().nullable(),
  cultureCode: z.string().nullable(),
  parentJarId: z.number().int().nullable(),
  parentJarLabel: z.string().nullable(),
  inoculumMl: z.number().nullable(),
  room: z.string().nullable(),
  shelf: z.string().nullable(),
  shelfPosition: z.number().int().nullable(),
  inoculatedAt: z.string(),
  inoculatedOn: z.string(),
  colonisedOn: z.string().nullable(),
  endedOn: z.string().nullable(),
  imported: z.boolean(),
});
export type JarRowDto = z.infer<typeof jarRowSchema>;

export const jarBatchResultSchema = z.object({ jars: z.array(jarRowSchema), warnings: z.array(z.string()) });
export type JarBatchResultDto = z.infer<typeof jarBatchResultSchema>;

export const jarEventInputTypes = [
  'check',
  'shaken',
  'moved',
  'released',
  'hold',
  'discarded',
  'colonised',
  'resume',
] as const;
export type JarEventInputType = (typeof jarEventInputTypes)[number];

/** From which statuses each event may be recorded; contaminated is set by incidents, never by an event. */
export const jarEventAllowedFrom: Record<JarEventInputType, readonly JarStatus[]> = {
  check: ['incubating', 'colonised', 'on-hold', 'contaminated'],
  shaken: ['incubating', 'colonised'],
  moved: ['incubating', 'colonised', 'on-hold', 'contaminated'],
  colonised: ['incubating'],
  released: ['colonised'],
  hold: ['incubating', 'colonised'],
  discarded: ['incubating', 'colonised', 'on-hold', 'contaminated'],
  resume: ['on-hold'],
};

const eventBase = { note: note.optional(), at: instant.optional() };

export const jarEventInputSchema = z.discriminatedUnion(
  'type',
  [
    z.object({
      type: z.literal('check'),
      percentColonised: z.coerce
        .number()
        .int('must be a whole number')
        .min(0, 'must be 0 to 100')
        .max(100, 'must be 0 to 100'),
      photoId: optionalId,
      ...eventBase,
    }),
    z.object({ type: z.literal('shaken'), ...eventBase }),
    z.object({ type: z.literal('colonised'), ...eventBase }),
    z.object({ type: z.literal('moved'), room: place, shelf: place, ...eventBase }),
    z
      .object({
        type: z.literal('released'),
        releasedTo: releasedToSchema,
        releasedToWho: z.string().trim().max(120, 'use at most 120 characters').optional(),
        ...eventBase,
      })
      .refine((v) => v.releasedTo !== 'customer' || (v.releasedToWho ?? '').length > 0, {
        path: ['releasedToWho'],
        message: 'name the customer, so the jar can be recalled',
      }),
    z.object({ type: z.literal('hold'), reason, ...eventBase }),
    z.object({ type: z.literal('discarded'), reason, ...eventBase }),
    z.object({ type: z.literal('resume'), reason, ...eventBase }),
  ],
  { error: `type: use one of ${jarEventInputTypes.join(', ')}` },
);
export type JarEventInput = z.infer<typeof jarEventInputSchema>;
export type JarEventFields = z.input<typeof jarEventInputSchema>;

export const jarEventSchema = z.object({
  id: z.number().int(),
  type: z.string(),
  at: z.string(),
  onDate: z.string(),
  byName: z.string(),
  percentColonised: z.number().int().nullable(),
  room: z.string().nullable(),
  shelf: z.string().nullable(),
  releasedTo: releasedToSchema.nullable(),
  releasedToWho: z.string().nullable(),
  newStatus: z.string().nullable(),
  photoId: z.number().int().nullable(),
  note: z.string().nullable(),
});
export type JarEventDto = z.infer<typeof jarEventSchema>;

export const shelfQuerySchema = z.object({ room: place, shelf: place });
export type ShelfQuery = z.infer<typeof shelfQuerySchema>;

export const shelfMarks = ['clean', 'colonised', 'shaken'] as const;
export const shelfWalkSchema = z
  .object({
    marks: z
      .array(
        z.object({
          jarId: idSchema,
          mark: z.enum(shelfMarks, { error: `use one of ${shelfMarks.join(', ')}` }),
          percentColonised: z.coerce.number().int().min(0, 'must be 0 to 100').max(100, 'must be 0 to 100').optional(),
          note: note.optional(),
        }),
      )
      .min(1, 'mark at least one jar')
      .max(500, 'mark at most 500 jars at once'),
  })
  .superRefine((v, ctx) => {
    const seen = new Set<number>();
    v.marks.forEach((m, i) => {
      if (seen.has(m.jarId))
        ctx.addIssue({ code: 'custom', path: ['marks', i, 'jarId'], message: 'this jar is marked twice' });
      seen.add(m.jarId);
    });
  });
export type ShelfWalkInput = z.infer<typeof shelfWalkSchema>;
export type ShelfMark = (typeof shelfMarks)[number];

export const shelfWalkResultSchema = z.object({ marked: z.number().int(), jars: z.array(jarRowSchema) });
export type ShelfWalkResultDto = z.infer<typeof shelfWalkResultSchema>;

export const labelSheetQuerySchema = z
  .object({
    ids: z
      .string()
      .transform((s) =>
        s
          .split(',')
          .map((x) => x.trim())
          .filter(Boolean)
          .map(Number),
      )
      .pipe(
        z
          .array(z.number('list jar ids separated by commas').int().positive())
          .min(1, 'list at least one jar id')
          .max(500, 'list at most 500 jars'),
      )
      .optional(),
    sessionId: optionalId,
  })
  .refine((v) => (v.ids === undefined) !== (v.sessionId === undefined), {
    path: ['ids'],
    message: 'give either ids or sessionId',
  });
export type LabelSheetQuery = z.infer<typeof labelSheetQuerySchema>;

export const jarLabelSchema = z.object({
  id: z.number().int(),
  label: z.string(),
  grain: z.string(),
  inoculatedOn: z.string(),
  sessionCode: z.string().nullable(),
  inoculumCode: z.string().nullable(),
  pageUrl: z.string(),
  qrPath: z.string(),
});
export type JarLabelDto = z.infer<typeof jarLabelSchema>;

export const labelParamsSchema = z.object({ label: z.string().trim().min(1).max(40) });

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
  z.object({
    kind: z.literal('jar'),
    id: z.number().int(),
    label: z.string(),
    status: jarStatusSchema,
    inoculatedOn: z.string(),
  }),
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

export const holdSchema = z.object({ reason });
export type HoldInput = z.infer<typeof holdSchema>;

export const lineageNodeSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('culture'), id: z.number().int(), code: z.string(), state: z.string() }),
  z.object({
    kind: z.literal('jar'),
    id: z.number().int(),
    label: z.string(),
    status: jarStatusSchema,
    inoculatedOn: z.string(),
    releasedTo: releasedToSchema.nullable(),
    releasedToWho: z.string().nullable(),
    releasedOn: z.string().nullable(),
  }),
]);
export type LineageNodeDto = z.infer<typeof lineageNodeSchema>;
export interface LineageTreeDto {
  node: LineageNodeDto;
  children: LineageTreeDto[];
}

export const recallRowSchema = z.object({
  label: z.string(),
  releasedTo: releasedToSchema.nullable(),
  releasedToWho: z.string().nullable(),
  releasedOn: z.string().nullable(),
});
export type RecallRowDto = z.infer<typeof recallRowSchema>;

export const holdResultSchema = z.object({
  held: z.array(z.string()),
  recall: z.array(recallRowSchema),
  /** Descendants left as they were: already on hold, contaminated or discarded. */
  unchanged: z.array(z.object({ label: z.string(), status: jarStatusSchema })),
});
export type HoldResultDto = z.infer<typeof holdResultSchema>;

/** A room and shelf that hold jars still incubating, for the shelf walk's pickers. */
export const shelfPlaceSchema = z.object({ room: z.string(), shelf: z.string(), incubating: z.number().int() });
export type ShelfPlaceDto = z.infer<typeof shelfPlaceSchema>;

export const undoShelfMarkSchema = z.object({ key: z.string().trim().min(1, 'name the mark to undo').max(100) });
export type UndoShelfMarkInput = z.infer<typeof undoShelfMarkSchema>;
