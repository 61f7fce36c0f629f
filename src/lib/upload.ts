import { apiUrl, errorFromBody, getCsrfToken, isStaleCsrf, networkError, refreshCsrfToken } from './api-client';

export interface UploadOptions {
  method?: 'POST' | 'PUT';
  /** Called with 0…1 as the body goes out. */
  onProgress?: (fraction: number) => void;
  signal?: AbortSignal;
  headers?: Record<string, string>;
}

function send(path: string, body: FormData | Blob, token: string, options: UploadOptions) {
  return new Promise<{ status: number; body: unknown }>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open(options.method ?? 'POST', apiUrl(path));
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.setRequestHeader('X-CSRF-Token', token);
    for (const [name, value] of Object.entries(options.headers ?? {})) xhr.setRequestHeader(name, value);
    // FormData sets its own multipart boundary; a bare Blob (a CSV file) says its own type.
    if (!(body instanceof FormData) && body.type) xhr.setRequestHeader('Content-Type', body.type);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable) options.onProgress?.(event.loaded / event.total);
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
    xhr.onabort = () => reject(new DOMException('Upload cancelled', 'AbortError'));
    options.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    xhr.send(body);
  });
}

/** Sends with progress and the stale-token retry, and hands back whatever the server answered. */
export async function uploadRaw(path: string, body: FormData | Blob, options: UploadOptions = {}) {
  let res = await send(path, body, await getCsrfToken(), options);
  if (res.status === 403 && isStaleCsrf(errorFromBody(res.status, res.body))) {
    res = await send(path, body, await refreshCsrfToken(), options);
  }
  return res;
}

/** Sends a file with upload progress, which fetch cannot report. */
export async function upload<T>(path: string, body: FormData | Blob, options: UploadOptions = {}): Promise<T> {
  const res = await uploadRaw(path, body, options);
  if (res.status < 200 || res.status >= 300) throw errorFromBody(res.status, res.body);
  options.onProgress?.(1);
  return res.body as T;
}
