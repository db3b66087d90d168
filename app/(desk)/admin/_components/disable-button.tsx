'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { summaryOf } from '@/app/_components/action-errors';
import { FormError, FormNotice } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { setUserDisabledAction } from '../actions';
import { ConfirmStep } from './confirm-step';

/** Disables a sign-in (it stops working at the next request) or enables it again, after a confirmation. */
export function DisableButton({ userId, disabled, name }: { userId: string; disabled: boolean; name: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const verb = disabled ? 'Enable' : 'Disable';
  const toggle = () =>
    start(async () => {
      setError(null);
      const res = await setUserDisabledAction({ userId, disabled: !disabled });
      setAsking(false);
      if (!res.ok) return setError(summaryOf(res.errors, 'Nothing was changed.'));
      setNotice(disabled ? `${name} can sign in again.` : `${name}'s sign-in is disabled; open sessions end now.`);
      router.refresh();
    });
  return (
    <div className="space-y-1">
      {asking ? (
        <ConfirmStep
          question={disabled ? `Let ${name} sign in again?` : `Disable ${name}'s sign-in? They are signed out at once.`}
          confirmLabel={verb}
          danger={!disabled}
          pending={pending}
          onConfirm={toggle}
          onCancel={() => setAsking(false)}
        />
      ) : (
        <SubmitButton
          type="button"
          variant={disabled ? 'secondary' : 'danger'}
          onClick={() => {
            setNotice(null);
            setAsking(true);
          }}
          className="px-3 py-1.5"
          aria-label={`${verb} ${name}`}
        >
          {verb}
        </SubmitButton>
      )}
      <FormError message={error} />
      <FormNotice message={notice} testId="people-notice" />
    </div>
  );
}
