import {
  importRejectionSchema,
  importResultSchema,
  type ImportError,
  type ImportResult,
} from '../../../../shared/schemas/imports';
import {
  apiUrl,
  errorFromBody,
  getCsrfToken,
  isStaleCsrf,
  networkError,
  refreshCsrfToken,
} from '../../../lib/api-client';

export type HistoryImportAnswer =
  { kind: 'imported'; result: ImportResult } | { kind: 'rejected'; errors: ImportError[] };

function send(body: FormData, token: string, onProgress: (fraction: number) => void) {
  return new Promise<{ status: number; body: unknown }>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', apiUrl('/imports/history'));
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('X-CSRF-Token', token);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) onProgress(event.loaded / event.total);
    };
    xhr.onload = () => {
      let parsed: unknown;
      try {
        parsed = xhr.responseText ? (JSON.parse(xhr.responseText) as unknown) : undefined;
      } catch {
        parsed = undefined;
      }
      resolve({ status: xhr.status, body: parsed });
    };
    xhr.onerror = () => reject(networkError());
    xhr.send(body);
  });
}

/**
 * The shared upload helper turns every non-2xx into an ApiError; a rejected import's 422 carries
 * the list of line errors the screen shows, so this reads that body itself.
 */
export async function sendHistory(file: File, onProgress: (fraction: number) => void): Promise<HistoryImportAnswer> {
  const body = new FormData();
  body.append('file', file);
  let res = await send(body, await getCsrfToken(), onProgress);
  if (res.status === 403 && isStaleCsrf(errorFromBody(res.status, res.body))) {
    res = await send(body, await refreshCsrfToken(), onProgress);
  }
  if (res.status === 422) {
    const rejected = importRejectionSchema.safeParse(res.body);
    if (rejected.success) return { kind: 'rejected', errors: rejected.data.errors };
  }
  if (res.status < 200 || res.status >= 300) throw errorFromBody(res.status, res.body);
  onProgress(1);
  return { kind: 'imported', result: importResultSchema.parse(res.body) };
}
