'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type * as z from 'zod/mini';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError, FormNotice } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { SelectField } from '@/app/_components/select-field';
import { TextField } from '@/app/_components/text-field';
import { accountCreateSchema, type AccountCreateInput } from '@/lib/accounts/schema';
import { createAccountAction } from '../actions';
import { updateAccountAction } from '../[accountId]/actions';
import { PressureBasisField, type PressureBasis } from './pressure-basis-field';

type FormValues = z.input<typeof accountCreateSchema>;
type Mode = { kind: 'create' } | { kind: 'edit'; accountId: string };

const FIELDS = [
  'name',
  'site',
  'billingContactName',
  'billingContactEmail',
  'barometricPressureKpa',
  'barometricPressurePsia',
  'siteAltitudeM',
  'unitSystem',
  'currency',
] as const;

/** Customer account details, for a new prospect or to edit an existing account. */
export function AccountForm({ mode, initial }: { mode: Mode; initial?: FormValues }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const [askConfirm, setAskConfirm] = useState(false);
  const [notice, setNotice] = useState<string | null>(null);
  const [basis, setBasis] = useState<PressureBasis>(
    initial?.siteAltitudeM !== undefined && initial.siteAltitudeM !== '' ? 'altitude' : 'pressure',
  );
  const { register, handleSubmit, setError, setValue, clearErrors, formState, watch } = useForm<
    FormValues,
    unknown,
    AccountCreateInput
  >({
    resolver: zodResolver(accountCreateSchema),
    mode: 'onTouched',
    defaultValues: initial ?? {
      name: '',
      site: '',
      billingContactName: '',
      billingContactEmail: '',
      barometricPressureKpa: '',
      barometricPressurePsia: '',
      siteAltitudeM: '',
      unitSystem: 'si',
      currency: 'USD',
      confirmDuplicateName: false,
    },
  });
  const unitSystem = watch('unitSystem');
  // The barometric pressure is asked in the account's own units: kPa for SI, psia for US customary.
  const baroField = unitSystem === 'us' ? 'barometricPressurePsia' : 'barometricPressureKpa';

  // Switching basis empties the other figure so a hidden, stale value can neither block nor be saved.
  const changeBasis = (next: PressureBasis) => {
    const hidden = next === 'pressure' ? 'siteAltitudeM' : baroField;
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
      // Only the barometric field in the account's units is sent.
      ...(basis === 'altitude' || baroField === 'barometricPressureKpa' ? { barometricPressurePsia: undefined } : {}),
      ...(baroField === 'barometricPressurePsia' ? { barometricPressureKpa: undefined } : {}),
    };
    const res =
      mode.kind === 'create'
        ? await createAccountAction(fields)
        : await updateAccountAction({ ...fields, accountId: mode.accountId });
    if (!res.ok) {
      if (res.status === 409 && res.errors.some((e) => e.path === 'confirmDuplicateName')) setAskConfirm(true);
      setFormError(showActionErrors(setError, res.errors, FIELDS));
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
        label="Units for datasheets, e-mails and the desk"
        options={[
          { value: 'si', label: 'SI (°C, kPa/bar, kg/h)' },
          { value: 'us', label: 'US customary (°F, psia/psig, lb/h)' },
        ]}
        data-testid="account-unit-system"
        error={e.unitSystem?.message}
        {...register('unitSystem')}
      />
      <TextField
        label="Quote currency"
        hint="Three-letter code, e.g. USD, EUR, GBP."
        maxLength={3}
        data-testid="account-currency"
        error={e.currency?.message}
        {...register('currency')}
      />
      <PressureBasisField
        key={baroField}
        className="md:col-span-2"
        basis={basis}
        onBasisChange={changeBasis}
        pressureUnit={unitSystem === 'us' ? 'psia' : 'kPa'}
        pressure={register(baroField)}
        altitude={register('siteAltitudeM')}
        pressureError={e[baroField]?.message}
        altitudeError={e.siteAltitudeM?.message}
      />
      {askConfirm && mode.kind === 'create' && (
        <label className="flex items-start gap-2 text-sm md:col-span-2">
          <input type="checkbox" data-testid="confirm-duplicate-name" {...register('confirmDuplicateName')} />
          This is a different company that has the same name; create a second account.
        </label>
      )}
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
