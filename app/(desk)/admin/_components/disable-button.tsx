'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { summaryOf } from '@/app/_components/action-errors';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { setUserDisabledAction } from '../actions';

/** Disables a sign-in (it stops working at the next request) or enables it again. */
export function DisableButton({ userId, disabled, name }: { userId: string; disabled: boolean; name: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const toggle = () =>
    start(async () => {
      setError(null);
      const res = await setUserDisabledAction({ userId, disabled: !disabled });
      if (res.ok) router.refresh();
      else setError(summaryOf(res.errors, 'Nothing was changed.'));
    });
  return (
    <div className="space-y-1">
      <SubmitButton
        type="button"
        variant={disabled ? 'secondary' : 'danger'}
        onClick={toggle}
        pending={pending}
        className="px-3 py-1.5"
        aria-label={`${disabled ? 'Enable' : 'Disable'} ${name}`}
      >
        {disabled ? 'Enable' : 'Disable'}
      </SubmitButton>
      <FormError message={error} />
    </div>
  );
}
