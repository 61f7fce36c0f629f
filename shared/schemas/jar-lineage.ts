import { z } from 'zod';
import { jarStatusSchema, releasedToSchema } from '../enums';
import { reason } from './jar-fields';

export const holdSchema = z.object({ reason });
export type HoldInput = z.infer<typeof holdSchema>;

/** A jar as a node of its lineage or of another jar's ancestry. */
export const jarNodeFields = {
  kind: z.literal('jar'),
  id: z.number().int(),
  label: z.string(),
  status: jarStatusSchema,
  inoculatedOn: z.string(),
};

export const lineageNodeSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('culture'), id: z.number().int(), code: z.string(), state: z.string() }),
  z.object({
    ...jarNodeFields,
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
