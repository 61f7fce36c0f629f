import type { z } from 'zod';
import { csrfSchema } from '../../shared/schemas/auth';
import { errorBodySchema, type FieldIssue } from '../../shared/schemas/common';
import { env } from '../config/env';

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: FieldIssue[];
  readonly requestId: string | undefined;

  constructor(status: number, code: string, message: string, issues: FieldIssue[] = [], requestId?: string) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.issues = issues;
    this.requestId = requestId;
  }
}

export function isApiError(error: unknown, status?: number): error is ApiError {
  return error instanceof ApiError && (status === undefined || error.status === status);
}

/** A sentence fit to show a user for any thrown value. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) {
    return error.requestId ? `${error.message} (reference ${error.requestId})` : error.message;
  }
  return 'Something went wrong. Try again.';
}

export type QueryParams = Record<string, string | number | boolean | null | undefined>;

export function apiUrl(path: string, query?: QueryParams): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value !== undefined && value !== null && value !== '') params.set(key, String(value));
  }
  const search = params.toString();
  return `${env.apiBase}${path}${search ? `?${search}` : ''}`;
}

export function errorFromBody(status: number, body: unknown): ApiError {
  const parsed = errorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, issues, requestId } = parsed.data.error;
    return new ApiError(status, code, message, issues, requestId);
  }
  if (status >= 502 && status <= 504) {
    return new ApiError(status, 'unavailable', 'The Asepta server is not answering. Try again in a moment.');
  }
  if (status >= 500) return new ApiError(status, 'server-error', 'The server ran into a problem. Try again shortly.');
  return new ApiError(status, 'http-error', `The request failed (HTTP ${status}).`);
}

export const networkError = () =>
  new ApiError(0, 'network', 'Cannot reach the Asepta server. Check the connection and try again.');

async function readJson(res: Response): Promise<unknown> {
  const text = await res.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

// The CSRF token lives in memory only; `generation` drops answers that belong to a session that has since ended.
let csrfToken: string | undefined;
let csrfPending: Promise<string> | undefined;
let generation = 0;

export function getCsrfToken(): Promise<string> {
  if (csrfToken) return Promise.resolve(csrfToken);
  if (csrfPending) return csrfPending;
  const mine = generation;
  const pending = request('GET', '/auth/csrf', { schema: csrfSchema }).then(({ token }) => {
    if (mine === generation) csrfToken = token;
    return token;
  });
  csrfPending = pending;
  void pending
    .finally(() => {
      if (csrfPending === pending) csrfPending = undefined;
    })
    .catch(() => undefined);
  return pending;
}

/** Forget the token (after sign-in, sign-out or a stale-token answer) and fetch a fresh one. */
export function refreshCsrfToken(): Promise<string> {
  generation += 1;
  csrfToken = undefined;
  csrfPending = undefined;
  return getCsrfToken();
}

export const isStaleCsrf = (error: ApiError) => error.status === 403 && error.code === 'csrf-invalid';

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

interface RequestOptions<T> {
  body?: unknown;
  query?: QueryParams;
  signal?: AbortSignal;
  schema?: z.ZodType<T>;
  /** Extra headers, e.g. an Idempotency-Key on writes from the shelf. */
  headers?: Record<string, string>;
}

async function request<T>(method: Method, path: string, options: RequestOptions<T> = {}, retried = false): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json', ...options.headers };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET') headers['X-CSRF-Token'] = await getCsrfToken();

  let res: Response;
  try {
    res = await fetch(apiUrl(path, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (error) {
    if (options.signal?.aborted) throw error;
    throw networkError();
  }

  const body = await readJson(res);
  if (!res.ok) {
    const error = errorFromBody(res.status, body);
    if (method !== 'GET' && !retried && isStaleCsrf(error)) {
      await refreshCsrfToken();
      return request(method, path, options, true);
    }
    throw error;
  }
  return (options.schema ? options.schema.parse(body) : body) as T;
}

type NoBody<T> = Omit<RequestOptions<T>, 'body'>;

export const api = {
  get: <T>(path: string, options?: NoBody<T>) => request<T>('GET', path, options),
  post: <T = void>(path: string, body?: unknown, options?: NoBody<T>) => request<T>('POST', path, { ...options, body }),
  put: <T = void>(path: string, body?: unknown, options?: NoBody<T>) => request<T>('PUT', path, { ...options, body }),
  patch: <T = void>(path: string, body?: unknown, options?: NoBody<T>) =>
    request<T>('PATCH', path, { ...options, body }),
  delete: <T = void>(path: string, options?: NoBody<T>) => request<T>('DELETE', path, options),
};
