import { isApiError } from './api-client';

/**
 * The server's per-field messages of a failed save that belong to a form field, as
 * `[path, message]` pairs. Paths are dotted (`criteria.loads.tcll`, `contacts.0.email`), the same
 * as react-hook-form's names; a message whose top-level key is not in `fieldNames` is left for
 * the form's alert.
 */
export function serverFieldErrors(
  error: unknown,
  fieldNames: readonly string[],
): [path: string, message: string][] {
  if (!isApiError(error)) return [];
  return Object.entries(error.fields).filter(([path]) =>
    fieldNames.includes(path.split('.')[0] ?? ''),
  );
}
