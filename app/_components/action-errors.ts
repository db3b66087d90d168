import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { Issue } from '@/lib/errors';

/**
 * Puts a failed action's issues next to the matching inputs; returns the text for the form-level error: the
 * messages at path "" and those with no input on this form, so none is dropped.
 */
export function showActionErrors<T extends FieldValues>(
  setError: UseFormSetError<T>,
  errors: readonly Issue[],
  fields: readonly string[],
): string {
  const unplaced: string[] = [];
  for (const path of new Set(errors.map((e) => e.path))) {
    if (!path) continue;
    const message = messagesAt(errors, path);
    if (fields.includes(path)) setError(path as Path<T>, { type: 'server', message });
    else unplaced.push(message);
  }
  return [summaryOf(errors, 'Some fields need attention.'), ...unplaced].join(' ');
}

/** Every message about one field (or about the request as a whole, for ""), joined. */
export function messagesAt(errors: readonly Issue[], path: string): string {
  return errors
    .filter((e) => e.path === path)
    .map((e) => e.message)
    .join(' ');
}

/** The failure's own message (path ""), or `fallback` when it names fields only. */
export function summaryOf(errors: readonly Issue[], fallback: string): string {
  return messagesAt(errors, '') || fallback;
}
