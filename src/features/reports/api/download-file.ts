// Exports (xlsx, CSV) are files, not JSON: api-client.ts reads JSON only, so this one path fetches
// the bytes itself, names the file as the server says (Content-Disposition), and hands it to the
// browser. A failure throws the same ApiError with the server's message.
import type { ApiErrorBody } from '@shared/schemas/common';
import { ApiError } from '@/lib/api-client';

/** The export files the API serves. */
export const exportPaths = {
  study: (id: string, kind: ExportKind) => `/studies/${encodeURIComponent(id)}/export.${kind}`,
  comparison: (id: string, kind: ExportKind) => `/comparisons/${encodeURIComponent(id)}/export.${kind}`,
};

export type ExportKind = 'xlsx' | 'csv';

function fileNameFrom(disposition: string | null, fallback: string) {
  const match = /filename="?([^";]+)"?/i.exec(disposition ?? '');
  return match?.[1] ?? fallback;
}

async function errorFrom(response: Response): Promise<ApiError> {
  const body = (await response.json().catch(() => undefined)) as ApiErrorBody | undefined;
  if (body?.error)
    return new ApiError(response.status, body.error.code, body.error.message, body.error.fields ?? {});
  return new ApiError(
    response.status,
    'bad_response',
    `The server answered ${response.status}. Try again in a moment.`,
  );
}

/** Fetches /api`path` and saves it under the server's file name. */
export async function downloadFile(path: string, fallbackName: string): Promise<void> {
  let response: Response;
  try {
    response = await fetch(`/api${path}`, { credentials: 'same-origin' });
  } catch {
    throw new ApiError(
      0,
      'network',
      'Bellwether could not reach its server. Check the connection and try again.',
    );
  }
  if (!response.ok) throw await errorFrom(response);
  const blob = await response.blob();
  const url = URL.createObjectURL(blob);
  const a = document.createElement('a');
  a.href = url;
  a.download = fileNameFrom(response.headers.get('content-disposition'), fallbackName);
  document.body.append(a);
  a.click();
  a.remove();
  window.setTimeout(() => URL.revokeObjectURL(url), 1000);
}
