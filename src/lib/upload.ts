// Multipart uploads with progress. fetch reports no upload progress, so this one path uses
// XMLHttpRequest; it sends the same X-CSRF-Token and throws the same ApiError as api-client.ts.
import type { Me } from '@shared/schemas/api-types';
import type { ApiErrorBody } from '@shared/schemas/common';
import { ApiError } from './api-client';
import { meQueryKey, queryClient } from './query-client';

/** The server's own cap (server/upload.ts); said up front and checked before sending. */
export const maxUploadBytes = 20 * 1024 * 1024;

export type UploadProgress = { loaded: number; total: number; fraction: number };

export type UploadOptions = {
  onProgress?: (progress: UploadProgress) => void;
  signal?: AbortSignal;
};

function errorFrom(xhr: XMLHttpRequest): ApiError {
  let body: unknown;
  try {
    body = JSON.parse(xhr.responseText);
  } catch {
    body = undefined;
  }
  const error = (body as ApiErrorBody | undefined)?.error;
  if (typeof error?.code === 'string' && typeof error.message === 'string') {
    return new ApiError(xhr.status, error.code, error.message, error.fields ?? {});
  }
  return new ApiError(
    xhr.status,
    'bad_response',
    `The server answered ${xhr.status} ${xhr.statusText || ''}`.trim() + '. Try again in a moment.',
  );
}

/** POSTs `form` (multipart) to /api`path`; resolves with the JSON answer. */
export function uploadForm<T>(path: string, form: FormData, options: UploadOptions = {}): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', `/api${path}`);
    xhr.withCredentials = true;
    xhr.setRequestHeader('Accept', 'application/json');
    // The token api-client.ts holds comes from GET /api/me, which the query cache keeps.
    const csrf = queryClient.getQueryData<Me | null>(meQueryKey)?.csrfToken;
    if (csrf) xhr.setRequestHeader('X-CSRF-Token', csrf);
    xhr.upload.onprogress = (event) => {
      if (!event.lengthComputable) return;
      options.onProgress?.({
        loaded: event.loaded,
        total: event.total,
        fraction: event.loaded / event.total,
      });
    };
    xhr.onload = () => {
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          resolve((xhr.responseText ? JSON.parse(xhr.responseText) : undefined) as T);
        } catch {
          reject(
            new ApiError(xhr.status, 'bad_response', 'The server sent an answer that could not be read.'),
          );
        }
        return;
      }
      if (xhr.status === 401) void queryClient.invalidateQueries({ queryKey: meQueryKey });
      reject(errorFrom(xhr));
    };
    xhr.onerror = () =>
      reject(
        new ApiError(
          0,
          'network',
          'Bellwether could not reach its server. Check the connection and try again.',
        ),
      );
    xhr.onabort = () => reject(new DOMException('The upload was cancelled.', 'AbortError'));
    if (options.signal) {
      if (options.signal.aborted) return xhr.abort();
      options.signal.addEventListener('abort', () => xhr.abort(), { once: true });
    }
    xhr.send(form);
  });
}
