import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { isApiError } from './api-client';

/**
 * The one way a server error becomes form messages: each of the answer's `fields` that names a
 * field of this form is set on it; whatever is left (no fields, unknown fields, a network error)
 * comes back as one form-level message for the form to show.
 */
export function applyServerErrors<T extends FieldValues>(
  error: unknown,
  setError: UseFormSetError<T>,
  fieldNames: readonly Path<T>[],
  fallback: (error: unknown) => string = defaultMessage,
): string | null {
  if (!isApiError(error)) return fallback(error);
  const known = new Set<string>(fieldNames);
  const leftOver: string[] = [];
  let placed = 0;
  for (const [key, message] of Object.entries(error.fields ?? {})) {
    if (known.has(key)) {
      setError(key as Path<T>, { type: 'server', message });
      placed += 1;
    } else leftOver.push(message);
  }
  if (leftOver.length > 0) return leftOver.join(' ');
  return placed > 0 ? null : fallback(error);
}

function defaultMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  return 'Something went wrong. Try again.';
}
