'use client';

import { useRouter } from 'next/navigation';
import { summaryOf } from '@/app/_components/action-errors';
import { useState, useTransition } from 'react';
import { FormError, FormNotice } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { roleLabels, type UserRole } from '@/lib/auth/roles';
import { staffRoleValues } from '@/lib/users/schema';
import { changeUserRoleAction } from '../actions';
import { ConfirmStep } from './confirm-step';

/** Moves a staff member between sales engineer, support and admin, after saying what will change. */
export function RoleForm({ userId, role, name }: { userId: string; role: UserRole; name: string }) {
  const router = useRouter();
  const [chosen, setChosen] = useState<UserRole>(role);
  const [asking, setAsking] = useState(false);
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const confirm = () =>
    start(async () => {
      setError(null);
      const res = await changeUserRoleAction({ userId, role: chosen });
      setAsking(false);
      if (!res.ok) return setError(summaryOf(res.errors, 'Nothing was changed.'));
      setNotice(`${name} is now ${roleLabels[chosen]} (was ${roleLabels[role]}).`);
      router.refresh();
    });
  return (
    <div className="space-y-1">
      <div className="flex items-end gap-2">
        <label className="text-label">
          <span className="sr-only">Role of {name}</span>
          <select
            className="w-44 rounded border border-paper-line px-2 py-1.5"
            value={chosen}
            aria-label={`Role of ${name}`}
            onChange={(e) => {
              setChosen(e.target.value as UserRole);
              setNotice(null);
              setAsking(false);
            }}
          >
            {staffRoleValues.map((r) => (
              <option key={r} value={r}>
                {roleLabels[r]}
              </option>
            ))}
          </select>
        </label>
        {!asking && (
          <SubmitButton
            type="button"
            variant="secondary"
            className="px-3 py-1.5"
            disabled={chosen === role}
            onClick={() => setAsking(true)}
          >
            Change
          </SubmitButton>
        )}
      </div>
      {asking && (
        <ConfirmStep
          question={`Change ${name} from ${roleLabels[role]} to ${roleLabels[chosen]}?`}
          confirmLabel="Change role"
          pending={pending}
          onConfirm={confirm}
          onCancel={() => {
            setAsking(false);
            setChosen(role);
          }}
        />
      )}
      <FormError message={error} />
      <FormNotice message={notice} testId="people-notice" />
    </div>
  );
}
