import { z } from 'zod';
import { idSchema } from './common';
import { note, place } from './jar-fields';
import { jarRowSchema } from './jars';

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

/** A room and shelf that hold jars still incubating, for the shelf walk's pickers. */
export const shelfPlaceSchema = z.object({ room: z.string(), shelf: z.string(), incubating: z.number().int() });
export type ShelfPlaceDto = z.infer<typeof shelfPlaceSchema>;

export const undoShelfMarkSchema = z.object({ key: z.string().trim().min(1, 'name the mark to undo').max(100) });
export type UndoShelfMarkInput = z.infer<typeof undoShelfMarkSchema>;
