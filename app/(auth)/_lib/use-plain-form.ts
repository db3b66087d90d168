'use client';

import { useState, type ChangeEvent, type FormEvent } from 'react';
import type { FieldErrors } from './field-checks';

/**
 * A small form state for the sign-in and sign-up pages: a field's error shows once it has been left (or the form
 * submitted) and follows each change after that, as react-hook-form's "onTouched" mode does. `setServerErrors`
 * places the server's field messages until the field is edited.
 */
export function usePlainForm<K extends string>(
  fields: readonly K[],
  check: (values: Record<string, string>) => FieldErrors,
) {
  const [values, setValues] = useState<Record<string, string>>(Object.fromEntries(fields.map((f) => [f, ''])));
  const [touched, setTouched] = useState<Set<string>>(new Set());
  const [server, setServer] = useState<FieldErrors>({});
  const [submitting, setSubmitting] = useState(false);
  const own = check(values);
  const errors: FieldErrors = {};
  for (const f of fields) errors[f] = touched.has(f) ? (own[f] ?? server[f]) : server[f];

  const field = (name: K) => ({
    name,
    value: values[name] ?? '',
    onChange: (e: ChangeEvent<HTMLInputElement>) => {
      setValues((v) => ({ ...v, [name]: e.target.value }));
      setServer((s) => ({ ...s, [name]: undefined }));
    },
    onBlur: () => setTouched((t) => (t.has(name) ? t : new Set(t).add(name))),
    error: errors[name],
  });

  const onSubmit = (send: (values: Record<K, string>) => Promise<void>) => async (e: FormEvent) => {
    e.preventDefault();
    setTouched(new Set(fields));
    const invalid = fields.find((f) => own[f]);
    if (invalid) {
      // As react-hook-form did: the first field in error takes the focus.
      const input = (e.currentTarget as HTMLFormElement).elements.namedItem(invalid);
      if (input instanceof HTMLInputElement) input.focus();
      return;
    }
    setSubmitting(true);
    try {
      await send(values as Record<K, string>);
    } finally {
      setSubmitting(false);
    }
  };

  return { field, onSubmit, submitting, setServerErrors: setServer };
}
