import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import type { FieldErrors } from '@/lib/actions/define-action';

/**
 * Puts a server action's field errors next to the matching inputs; returns the messages that have no
 * input on this form so the caller can show them with the form error instead of dropping them.
 */
export function applyFieldErrors<T extends FieldValues>(
  setError: UseFormSetError<T>,
  fieldErrors: FieldErrors,
  fields: readonly string[],
): string[] {
  const unplaced: string[] = [];
  for (const [key, messages] of Object.entries(fieldErrors)) {
    const message = messages.join(' ');
    if (fields.includes(key)) setError(key as Path<T>, { type: 'server', message });
    else unplaced.push(message);
  }
  return unplaced;
}

/** The text for the form-level error element. */
export function formErrorText(formError: string | null, unplaced: string[]): string {
  return [formError ?? 'Check the fields below.', ...unplaced].join(' ');
}
