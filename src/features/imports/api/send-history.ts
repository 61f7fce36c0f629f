import {
  importRejectionSchema,
  importResultSchema,
  type ImportError,
  type ImportResult,
} from '../../../../shared/schemas/imports';
import { errorFromBody } from '../../../lib/api-client';
import { uploadRaw } from '../../../lib/upload';

export type HistoryImportAnswer =
  { kind: 'imported'; result: ImportResult } | { kind: 'rejected'; errors: ImportError[] };

/**
 * `upload` turns every non-2xx into an ApiError; a rejected import's 422 carries
 * the list of line errors the screen shows, so this reads that body itself.
 */
export async function sendHistory(file: File, onProgress: (fraction: number) => void): Promise<HistoryImportAnswer> {
  const body = new FormData();
  body.append('file', file);
  const res = await uploadRaw('/imports/history', body, { onProgress });
  if (res.status === 422) {
    const rejected = importRejectionSchema.safeParse(res.body);
    if (rejected.success) return { kind: 'rejected', errors: rejected.data.errors };
  }
  if (res.status < 200 || res.status >= 300) throw errorFromBody(res.status, res.body);
  onProgress(1);
  return { kind: 'imported', result: importResultSchema.parse(res.body) };
}
