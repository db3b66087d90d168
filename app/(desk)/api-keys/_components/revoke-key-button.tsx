'use client';

import { useRouter } from 'next/navigation';
import { useState, useTransition } from 'react';
import { FormError } from '@/app/_components/form-errors';
import { SubmitButton } from '@/app/_components/submit-button';
import { revokeApiKeyAction } from '../actions';
import { summaryOf } from '@/app/_components/action-errors';

/** Revokes a key after a confirmation; tools using it are refused from their next request. */
export function RevokeKeyButton({ keyId, name }: { keyId: string; name: string }) {
  const router = useRouter();
  const [pending, start] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const revoke = () => {
    if (!window.confirm(`Revoke “${name}”? Tools using it are refused from their next request.`)) return;
    start(async () => {
      setError(null);
      const res = await revokeApiKeyAction({ keyId });
      if (res.ok) router.refresh();
      else setError(summaryOf(res.errors, 'The key was not revoked.'));
    });
  };
  return (
    <div className="space-y-1">
      <SubmitButton
        type="button"
        variant="danger"
        onClick={revoke}
        pending={pending}
        pendingLabel="Revoking…"
        className="px-3 py-1.5"
        aria-label={`Revoke ${name}`}
      >
        Revoke
      </SubmitButton>
      <FormError message={error} />
    </div>
  );
}
