import { z } from 'zod';
import { createIncidentSchema, type CreateIncidentInput } from '../../../shared/schemas/incidents';
import { ApiError } from '../../lib/api-client';

const { jarIds: _ids, jarLabels: _labels, ...fields } = createIncidentSchema.shape;

/** The flag screen types jar labels into one box (scanner, keyboard or the jar page's link). */
export const flagFormSchema = z.object({
  ...fields,
  jarText: z
    .string()
    .trim()
    .min(1, 'scan or type the jar label')
    .refine((t) => splitLabels(t).every((l) => l.length <= 40), 'a jar label has at most 40 characters'),
});
export type FlagFormInput = z.input<typeof flagFormSchema>;
export type FlagFormValues = z.output<typeof flagFormSchema>;

export function splitLabels(text: string): string[] {
  return [
    ...new Set(
      text
        .split(/[\s,;]+/)
        .map((l) => l.trim())
        .filter(Boolean),
    ),
  ];
}

export function toCreateInput({ jarText, ...rest }: FlagFormValues): CreateIncidentInput {
  return { ...rest, jarLabels: splitLabels(jarText) };
}

/** The server names jarLabels.N; on this form that is the one label box. */
export function onFlagForm(error: unknown): unknown {
  if (!(error instanceof ApiError)) return error;
  const issues = error.issues.map((i) =>
    i.path.startsWith('jarLabels') || i.path.startsWith('jarIds') ? { ...i, path: 'jarText' } : i,
  );
  return new ApiError(error.status, error.code, error.message, issues, error.requestId);
}
