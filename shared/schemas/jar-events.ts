import { z } from 'zod';
import { releasedToSchema, type JarStatus } from '../enums';
import { instant, note, optionalId, place, reason } from './jar-fields';

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
