'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError, FormNotice } from '@/app/_components/form-errors';
import { SelectField } from '@/app/_components/select-field';
import { SubmitButton } from '@/app/_components/submit-button';
import { TextField } from '@/app/_components/text-field';
import { roleLabels } from '@/lib/auth/roles';
import { staffInviteSchema, staffRoleValues, type StaffInviteInput } from '@/lib/users/schema';
import { inviteStaffAction } from '../actions';

/** Invites a sales engineer, support person or admin by e-mail; the link sets up their sign-in in that role. */
export function InviteStaffForm() {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const { register, handleSubmit, setError, reset, formState } = useForm<StaffInviteInput>({
    resolver: zodResolver(staffInviteSchema),
    defaultValues: { email: '', role: 'sales_engineer' },
  });
  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    setNotice(null);
    const res = await inviteStaffAction(values);
    if (!res.ok) {
      setFormError(showActionErrors(setError, res.errors, ['email', 'role']));
      return;
    }
    setNotice(`Invitation sent to ${res.data.email} as ${roleLabels[res.data.role]}.`);
    reset({ email: '', role: values.role });
    router.refresh();
  });
  const e = formState.errors;
  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-label="Invite a staff member"
      className="space-y-2"
      data-testid="invite-staff"
    >
      <div className="flex flex-wrap items-end gap-3">
        <TextField label="E-mail" type="email" className="min-w-64" error={e.email?.message} {...register('email')} />
        <SelectField
          label="Role"
          className="w-48"
          options={staffRoleValues.map((r) => ({ value: r, label: roleLabels[r] }))}
          error={e.role?.message}
          {...register('role')}
        />
        <SubmitButton pending={formState.isSubmitting} pendingLabel="Inviting…">
          Send invitation
        </SubmitButton>
      </div>
      <FormError message={formError} />
      <FormNotice message={notice} />
    </form>
  );
}
