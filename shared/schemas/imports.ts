import { z } from 'zod';

/** The history file's columns (DESIGN.md §5), in the order the screen documents them. */
export const historyColumns = [
  'jar_label',
  'grain',
  'cook_run',
  'cook_minutes',
  'inoculated_on',
  'session',
  'operator',
  'culture',
  'outcome',
  'contaminant',
  'found_on',
] as const;
export type HistoryColumn = (typeof historyColumns)[number];

/** A file whose rows are all clean may leave these two columns out. */
export const optionalHistoryColumns: readonly HistoryColumn[] = ['contaminant', 'found_on'];

export const historyOutcomes = ['clean', 'contaminated'] as const;

/** Largest accepted file, body or multipart part alike. */
export const historyMaxBytes = 10 * 1024 * 1024;

export const importErrorSchema = z.object({
  /** 1-based physical line on which the record starts; the header is line 1. */
  line: z.number().int(),
  /** The header name, or '' when the problem is not in one column. */
  column: z.string(),
  message: z.string(),
});
export type ImportError = z.infer<typeof importErrorSchema>;

export const importResultSchema = z.object({
  imported: z.object({ jars: z.number().int(), incidents: z.number().int() }),
  ignoredColumns: z.array(z.string()),
});
export type ImportResult = z.infer<typeof importResultSchema>;

export const importRejectionSchema = z.object({ errors: z.array(importErrorSchema) });
export type ImportRejection = z.infer<typeof importRejectionSchema>;
