// Puts the server's per-field messages (ApiError.fields) on the matching form fields; anything
// that does not belong to a field comes back as the form's own message.
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from './api-client';

export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
): string | null {
  if (!(error instanceof ApiError)) return error instanceof Error ? error.message : 'Something went wrong.';
  let placed = false;
  for (const [key, message] of Object.entries(error.fields)) {
    const name = fieldNames.find((f) => f === key);
    if (name) {
      setError(name, { type: 'server', message });
      placed = true;
    }
  }
  return placed ? null : error.message;
}
