import { z } from 'zod';
import { idSchema, recordedInstantSchema } from './common';

export const place = z.string().trim().min(1, 'enter a name').max(40, 'use at most 40 characters');
export const optionalPlace = place.optional();
export const note = z.string().trim().max(2000, 'use at most 2000 characters');
export const reason = z
  .string()
  .trim()
  .min(3, 'give a reason of at least 3 characters')
  .max(500, 'use at most 500 characters');
export const instant = recordedInstantSchema.transform((v) => new Date(v));
/** Lets the client send '' from an empty input. */
export const optionalId = z.preprocess((v) => (v === '' || v === null ? undefined : v), idSchema.optional());
