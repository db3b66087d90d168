import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/guards';
import { getEntitlement } from '@/lib/billing/entitlements';
import { plans } from '@/lib/billing/plans';
import { BillingPanel } from './_components/billing-panel';

export const metadata: Metadata = { title: 'Subscription' };

/** Why a download link sent the visitor here (`?locked=`), in words. */
const lockedNotices: Record<string, string> = {
  datasheet:
    'That datasheet is locked: datasheets issued to your account download while a subscription is active. Choose a plan below and the link works straight away.',
  'quote-pdf':
    'That quote PDF is locked: it carries the datasheets issued to your account, which download while a subscription is active. Choose a plan below and the link works straight away.',
};

export default async function BillingPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const user = await requirePageUser('/billing', 'billing:manage');
  const sp = await searchParams;
  const lockedNotice = typeof sp.locked === 'string' ? lockedNotices[sp.locked] : undefined;
  const checkout = sp.checkout === 'success' ? 'success' : sp.checkout === 'cancelled' ? 'cancelled' : null;
  const entitlement = user.accountId ? await getEntitlement(user.accountId) : null;
  return (
    <main className="mx-auto max-w-3xl px-6 py-10">
      <h1 className="text-2xl font-semibold">Subscription</h1>
      <p className="mt-2 text-ink-soft">
        A subscription unlocks downloads of every datasheet issued to your account and lets your team run and save
        sizings.
      </p>
      {lockedNotice && entitlement && !entitlement.unlocked && (
        <p
          className="mt-4 rounded-md border border-copper-100 bg-copper-50 p-3 text-sm"
          role="status"
          data-testid={`${sp.locked}-locked`}
        >
          {lockedNotice}
        </p>
      )}
      {entitlement ? (
        <BillingPanel initial={entitlement} checkout={checkout} plans={[...plans]} />
      ) : (
        <p className="mt-6">Your user is not linked to a customer account.</p>
      )}
    </main>
  );
}
