// The one HTTP client: a pure fetch wrapper. JSON in and out, same-origin cookies, the CSRF token
// on every mutation, and one typed ApiError built from the server's one error shape
// { error: { code, message, fields? } }. Toasts and redirects are decided by hooks and components.
import type { ApiErrorBody } from '@shared/schemas/common';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message);
    this.name = 'ApiError';
  }
}

/** Set by the auth hooks from GET /api/me or the sign-in answer; cleared at sign-out. */
let csrfToken: string | null = null;
export function setCsrfToken(token: string | null) {
  csrfToken = token || null;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';
export type QueryParams = Record<string, string | number | boolean | null | undefined>;
type RequestOptions = { method?: Method; body?: unknown; query?: QueryParams; signal?: AbortSignal };

function withQuery(path: string, query?: QueryParams): string {
  if (!query) return path;
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) {
    if (value !== undefined && value !== null && value !== '') search.set(key, String(value));
  }
  const s = search.toString();
  return s ? `${path}?${s}` : path;
}

function isErrorBody(value: unknown): value is ApiErrorBody {
  const error = (value as ApiErrorBody | null)?.error;
  return typeof error?.code === 'string' && typeof error.message === 'string';
}

async function readJson(response: Response): Promise<unknown> {
  const type = response.headers.get('content-type') ?? '';
  if (!type.includes('application/json')) return undefined;
  try {
    return await response.json();
  } catch {
    return undefined;
  }
}

export async function request<T>(path: string, options: RequestOptions = {}): Promise<T> {
  const method = options.method ?? 'GET';
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (options.body !== undefined) headers['Content-Type'] = 'application/json';
  if (method !== 'GET' && csrfToken) headers['X-CSRF-Token'] = csrfToken;

  let response: Response;
  try {
    response = await fetch(withQuery(`/api${path}`, options.query), {
      method,
      headers,
      credentials: 'same-origin',
      body: options.body === undefined ? undefined : JSON.stringify(options.body),
      signal: options.signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === 'AbortError') throw error;
    throw new ApiError(
      0,
      'network',
      'Bellwether could not reach its server. Check the connection and try again.',
    );
  }

  if (response.status === 204) return undefined as T;
  const data = await readJson(response);
  if (response.ok) return data as T;
  if (isErrorBody(data)) {
    throw new ApiError(response.status, data.error.code, data.error.message, data.error.fields ?? {});
  }
  throw new ApiError(
    response.status,
    'bad_response',
    `The server answered ${response.status} ${response.statusText || ''}`.trim() + '. Try again in a moment.',
  );
}

export const api = {
  get: <T>(path: string, query?: QueryParams, signal?: AbortSignal) => request<T>(path, { query, signal }),
  post: <T>(path: string, body?: unknown) => request<T>(path, { method: 'POST', body: body ?? {} }),
  patch: <T>(path: string, body: unknown) => request<T>(path, { method: 'PATCH', body }),
  delete: <T>(path: string) => request<T>(path, { method: 'DELETE' }),
};
