'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type * as z from 'zod/mini';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { API_KEY_DEFAULT_PER_MINUTE, API_KEY_MAX_PER_MINUTE, apiKeyCreateSchema } from '@/lib/api-keys/schema';
import { createApiKeyAction } from '../actions';
import { NewKeyNotice } from './new-key-notice';

type Values = z.input<typeof apiKeyCreateSchema>;

/** Names a new key and sets its limit; the key itself is shown once, below the form. */
export function CreateKeyForm() {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const [made, setMade] = useState<{ key: string; name: string } | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<Values>({
    resolver: zodResolver(apiKeyCreateSchema),
    mode: 'onTouched',
    defaultValues: { name: '', perMinute: API_KEY_DEFAULT_PER_MINUTE },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setMade(null);
    const res = await createApiKeyAction(values);
    if (!res.ok) {
      setFormError(showActionErrors(setError, res.errors, ['name', 'perMinute']));
      return;
    }
    setMade({ key: res.data.key, name: res.data.name });
    reset({ name: '', perMinute: API_KEY_DEFAULT_PER_MINUTE });
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-3" aria-label="Create an API key">
      <div className="grid gap-3 sm:grid-cols-[2fr_1fr]">
        <TextField
          label="Name"
          hint="The tool or script that will use it, e.g. Estimating workbook"
          autoComplete="off"
          data-testid="api-key-name"
          error={formState.errors.name?.message}
          {...register('name')}
        />
        <TextField
          label="Requests a minute"
          hint={`Its own limit, 1 to ${API_KEY_MAX_PER_MINUTE}`}
          inputMode="numeric"
          data-testid="api-key-per-minute"
          error={formState.errors.perMinute?.message}
          {...register('perMinute')}
        />
      </div>
      <FormError message={formError} />
      {made && <NewKeyNotice name={made.name} apiKey={made.key} />}
      <SubmitButton pending={formState.isSubmitting} pendingLabel="Creating…" data-testid="api-key-create">
        Create key
      </SubmitButton>
    </form>
  );
}
