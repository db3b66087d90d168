import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/guards';
import { getEntitlement } from '@/lib/billing/entitlements';
import { plans } from '@/lib/billing/plans';
import { BillingPanel } from './_components/billing-panel';

export const metadata: Metadata = { title: 'Subscription' };

export default async function BillingPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const user = await requirePageUser('/billing', 'billing:manage');
  const sp = await searchParams;
  const checkout = sp.checkout === 'success' ? 'success' : sp.checkout === 'cancelled' ? 'cancelled' : null;
  const entitlement = user.accountId ? await getEntitlement(user.accountId) : null;
  return (
    <main className="mx-auto max-w-3xl px-6 py-10">
      <h1 className="text-2xl font-semibold">Subscription</h1>
      <p className="mt-2 text-ink-soft">
        A subscription unlocks downloads of every datasheet issued to your account and lets your team run and save
        sizings.
      </p>
      {entitlement ? (
        <BillingPanel initial={entitlement} checkout={checkout} plans={[...plans]} />
      ) : (
        <p className="mt-6">Your user is not linked to a customer account.</p>
      )}
    </main>
  );
}
