import { readingsUploadQuerySchema, type CookRunDetailDto } from '../../shared/schemas/cook-runs';
import type { Actor } from '../audit/audit.service';
import { badRequest, unprocessable } from '../core/errors';
import { assertCookRunExists, replaceCookRunReadings } from './cook-run-readings.service';
import { parseReadingsCsv } from './readings-csv';

const shownIssues = 50;

export interface CookRunLogUpload {
  /** The log's text, or null when the request carried none. */
  text: string | null;
  /** Where the probe sat: from the query (raw CSV body) or beside the file (multipart), not yet parsed. */
  placement: unknown;
}

/**
 * Replaces a run's temperature log with an uploaded CSV, or refuses it whole (422) naming up to fifty
 * lines; checks run in the order a user fixes them: the run, then a file at all, then its placement, then its lines.
 */
export async function uploadCookRunLog(actor: Actor, id: number, upload: CookRunLogUpload): Promise<CookRunDetailDto> {
  await assertCookRunExists(id);
  if (upload.text === null) {
    throw badRequest('file: send the temperature log as text/csv or as the multipart field "file"', [
      { path: 'file', message: 'is missing: send a CSV of elapsed minutes and °C' },
    ]);
  }
  const { placement } = readingsUploadQuerySchema.parse(upload.placement);
  const { samples, errors } = parseReadingsCsv(upload.text);
  if (errors.length) {
    const issues = errors.slice(0, shownIssues).map((e) => ({
      path: 'file',
      message: `line ${e.line}${e.column ? `, ${e.column}` : ''}: ${e.message}`,
    }));
    if (errors.length > shownIssues)
      issues.push({ path: 'file', message: `and ${errors.length - shownIssues} more errors` });
    throw unprocessable(
      `The temperature log has ${errors.length} error${errors.length === 1 ? '' : 's'}; nothing was stored.`,
      issues,
    );
  }
  return replaceCookRunReadings(actor, id, samples, placement);
}
