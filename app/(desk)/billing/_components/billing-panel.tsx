'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { summaryOf } from '@/app/_components/action-errors';
import type { ActionResult } from '@/lib/actions/define-action';
import { formatDate } from '@/app/_components/format';
import type { Entitlement } from '@/lib/billing/entitlements';
import { subscriptionLabels } from '@/lib/billing/labels';
import type { Plan } from '@/lib/billing/plans';
import { openPortalAction, startCheckoutAction } from '../actions';

// What each state means for the customer; the state's name comes from lib/billing/labels.ts.
const statusText: Record<Entitlement['reason'], string> = {
  active: 'datasheets are unlocked.',
  grace: 'datasheets stay unlocked during the grace period. Update your payment method.',
  'period-remaining': 'datasheets stay unlocked until the paid period ends.',
  none: 'datasheets are locked.',
  lapsed: 'datasheets are locked.',
};

/** Subscription state with checkout and portal buttons; polls while a fresh payment is being confirmed. */
export function BillingPanel({
  initial,
  checkout,
  plans,
}: {
  initial: Entitlement;
  checkout: 'success' | 'cancelled' | null;
  plans: Plan[];
}) {
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const { data } = useQuery({
    queryKey: ['billing-status'],
    queryFn: async () => (await (await fetch('/api/v1/billing/status')).json()) as Entitlement,
    initialData: initial,
    refetchInterval: (q) => (checkout === 'success' && !q.state.data?.unlocked ? 1000 : false),
  });
  const go = async (run: () => Promise<ActionResult<{ url: string }>>) => {
    setBusy(true);
    setError(null);
    const res = await run();
    if (res.ok) window.location.assign(res.data.url);
    else {
      setError(summaryOf(res.errors, 'That did not work; try again.'));
      setBusy(false);
    }
  };
  const ent = data ?? initial;
  return (
    <section className="mt-6 space-y-6">
      {checkout === 'success' && !ent.unlocked && (
        <p className="rounded-md bg-tide-50 p-3" role="status">
          Payment received; waiting for the payment service to confirm…
        </p>
      )}
      {checkout === 'cancelled' && !ent.unlocked && (
        <p className="rounded-md bg-copper-50 p-3 text-severity-warning" data-testid="checkout-cancelled" role="status">
          Checkout was not completed, so nothing was charged and your datasheets stay locked.
        </p>
      )}
      <div className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel">
        <p className="text-label uppercase text-ink-muted">Status</p>
        <p className="mt-1 text-lg font-medium" data-testid="subscription-status">
          {subscriptionLabels[ent.reason]}: {statusText[ent.reason]}
        </p>
        {ent.reason === 'grace' && ent.graceEndsAt ? (
          <p className="mt-1 text-sm text-severity-warning" data-testid="grace-ends">
            Grace period ends on {formatDate(ent.graceEndsAt)}; if the payment has not gone through by then, datasheets
            lock until it does.
          </p>
        ) : (
          ent.periodEnd && (
            <p className="mt-1 text-sm text-ink-muted">
              {ent.cancelAtPeriodEnd ? 'Ends' : 'Renews'} on {formatDate(ent.periodEnd)}
            </p>
          )
        )}
        {ent.status && (
          <button
            type="button"
            disabled={busy}
            onClick={() => go(() => openPortalAction({}))}
            className="mt-4 rounded-md border border-tide-600 px-4 py-2 text-tide-700 hover:bg-tide-50"
          >
            Change or cancel
          </button>
        )}
      </div>
      {!ent.unlocked && (
        <div className="grid gap-4 md:grid-cols-2">
          {plans.map((p) => (
            <div key={p.key} className="rounded-panel border border-paper-line bg-paper-raised p-panel">
              <h2 className="font-semibold">{p.name}</h2>
              <p className="mt-1 font-mono text-lg">{p.priceLabel}</p>
              <p className="mt-2 text-sm text-ink-soft">{p.blurb}</p>
              <button
                type="button"
                disabled={busy}
                onClick={() => go(() => startCheckoutAction({ plan: p.key }))}
                className="mt-4 rounded-md bg-copper-500 px-4 py-2 font-medium text-white hover:bg-copper-600 disabled:opacity-60"
              >
                Subscribe: {p.name}
              </button>
            </div>
          ))}
        </div>
      )}
      {error && (
        <p data-testid="form-error" role="alert" className="text-severity-danger">
          {error}
        </p>
      )}
    </section>
  );
}
