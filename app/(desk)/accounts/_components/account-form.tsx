'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { applyFieldErrors, formErrorText } from '@/app/_components/action-errors';
import { FormError, FormNotice } from '@/app/_components/form-errors';
import { SelectField } from '@/app/_components/select-field';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { accountInputSchema, type AccountInput } from '@/lib/accounts/schema';
import { createAccountAction } from '../actions';
import { updateAccountAction } from '../[accountId]/actions';
import { PressureBasisField, type PressureBasis } from './pressure-basis-field';

type FormValues = z.input<typeof accountInputSchema>;
type Mode = { kind: 'create' } | { kind: 'edit'; accountId: string };

const FIELDS = [
  'name',
  'site',
  'billingContactName',
  'billingContactEmail',
  'barometricPressureKpa',
  'siteAltitudeM',
  'unitSystem',
] as const;

const UNIT_OPTIONS = [
  { value: 'si', label: 'SI (°C, bar, kg/h)' },
  { value: 'us', label: 'US customary (°F, psig, lb/h)' },
];

/** Customer account details, for a new prospect or to edit an existing account. */
export function AccountForm({ mode, initial }: { mode: Mode; initial?: FormValues }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [basis, setBasis] = useState<PressureBasis>(
    initial?.siteAltitudeM !== undefined && initial.siteAltitudeM !== '' ? 'altitude' : 'pressure',
  );
  const { register, handleSubmit, setError, setValue, clearErrors, formState } = useForm<
    FormValues,
    unknown,
    AccountInput
  >({
    resolver: zodResolver(accountInputSchema),
    mode: 'onTouched',
    defaultValues: initial ?? {
      name: '',
      site: '',
      billingContactName: '',
      billingContactEmail: '',
      barometricPressureKpa: '',
      siteAltitudeM: '',
      unitSystem: 'si',
    },
  });

  // Switching basis empties the other figure so a hidden, stale value can neither block nor be saved.
  const changeBasis = (next: PressureBasis) => {
    const hidden = next === 'pressure' ? 'siteAltitudeM' : 'barometricPressureKpa';
    setValue(hidden, '');
    clearErrors(hidden);
    setBasis(next);
  };

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setNotice(null);
    // The site is described by one figure: the basis not chosen is not sent.
    const fields = {
      ...values,
      ...(basis === 'pressure' ? { siteAltitudeM: undefined } : { barometricPressureKpa: undefined }),
    };
    const res =
      mode.kind === 'create'
        ? await createAccountAction(fields)
        : await updateAccountAction({ ...fields, accountId: mode.accountId });
    if (!res.ok) {
      setFormError(formErrorText(res.formError, applyFieldErrors(setError, res.fieldErrors, FIELDS)));
      return;
    }
    if (mode.kind === 'create' && 'id' in res.data) {
      router.push(`/accounts/${res.data.id}`);
    } else {
      setNotice('Customer account saved.');
      router.refresh();
    }
  });

  const e = formState.errors;
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      className="grid gap-4 md:grid-cols-2"
      aria-label={mode.kind === 'create' ? 'New customer account' : 'Edit customer account'}
    >
      <TextField label="Company" autoComplete="organization" error={e.name?.message} {...register('name')} />
      <TextField
        label="Site"
        hint="Plant or site name, e.g. Riverside works"
        error={e.site?.message}
        {...register('site')}
      />
      <TextField
        label="Billing contact name"
        error={e.billingContactName?.message}
        {...register('billingContactName')}
      />
      <TextField
        label="Billing contact e-mail"
        type="email"
        hint="Quotes are sent to this address."
        error={e.billingContactEmail?.message}
        {...register('billingContactEmail')}
      />
      <SelectField
        label="Units the customer works in"
        hint="Sets the desk's units for its people, and its documents."
        error={e.unitSystem?.message}
        options={UNIT_OPTIONS}
        {...register('unitSystem')}
      />
      <PressureBasisField
        className="md:col-span-2"
        basis={basis}
        onBasisChange={changeBasis}
        pressure={register('barometricPressureKpa')}
        altitude={register('siteAltitudeM')}
        pressureError={e.barometricPressureKpa?.message}
        altitudeError={e.siteAltitudeM?.message}
      />
      <div className="space-y-3 md:col-span-2">
        <FormError message={formError} />
        <FormNotice message={notice} />
        <SubmitButton pending={formState.isSubmitting} pendingLabel="Saving…">
          {mode.kind === 'create' ? 'Create customer account' : 'Save changes'}
        </SubmitButton>
      </div>
    </form>
  );
}
