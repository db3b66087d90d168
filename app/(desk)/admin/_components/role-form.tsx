'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { showActionErrors } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SelectField } from '@/app/_components/select-field';
import { SubmitButton } from '@/app/_components/submit-button';
import { roleLabels } from '@/lib/auth/roles';
import { staffRoleValues, userRoleChangeSchema, type UserRoleChangeInput } from '@/lib/users/schema';
import { changeUserRoleAction } from '../actions';

/** Moves a staff member between sales engineer, support and admin. */
export function RoleForm({ userId, role, name }: { userId: string; role: UserRoleChangeInput['role']; name: string }) {
  const router = useRouter();
  const [formError, setFormError] = useState<string | null>(null);
  const { register, handleSubmit, setError, formState } = useForm<UserRoleChangeInput>({
    resolver: zodResolver(userRoleChangeSchema),
    defaultValues: { userId, role },
  });

  const onSubmit = handleSubmit(async (values) => {
    setFormError(null);
    const res = await changeUserRoleAction(values);
    if (!res.ok) setFormError(showActionErrors(setError, res.errors, ['role']));
    else router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-label={`Change the role of ${name}`} className="space-y-1">
      <input type="hidden" {...register('userId')} />
      <div className="flex items-end gap-2">
        <SelectField
          label={`Role of ${name}`}
          className="w-44 [&>label]:sr-only"
          options={staffRoleValues.map((r) => ({ value: r, label: roleLabels[r] }))}
          error={formState.errors.role?.message}
          {...register('role')}
        />
        <SubmitButton
          variant="secondary"
          pending={formState.isSubmitting}
          pendingLabel="Saving…"
          className="px-3 py-1.5"
        >
          Change
        </SubmitButton>
      </div>
      <FormError message={formError} />
    </form>
  );
}
