import type { Metadata } from 'next';
import Link from 'next/link';
import { plans } from '@/lib/billing/plans';

export const metadata: Metadata = { title: 'Plans' };

export default function PricingPage() {
  return (
    <div className="mx-auto max-w-4xl px-6 py-14">
      <h1 className="text-3xl font-semibold">Plans for customer accounts</h1>
      <p className="mt-3 max-w-2xl text-ink-soft">
        Anyone can size a duty on the public desk. A subscription lets your team save sizings to your account and
        download the revisioned PDF datasheets your vendor issues. One subscription covers every user of the account.
      </p>
      <div className="mt-8 grid gap-6 md:grid-cols-2">
        {plans.map((p) => (
          <article key={p.key} className="rounded-panel border border-paper-line bg-paper-raised p-panel shadow-panel">
            <h2 className="text-xl font-semibold">{p.name}</h2>
            <p className="mt-2 font-mono text-2xl">{p.priceLabel}</p>
            <p className="mt-3 text-ink-soft">{p.blurb}</p>
          </article>
        ))}
      </div>
      <p className="mt-8">
        <Link
          href="/sign-up"
          className="rounded-md bg-copper-500 px-5 py-2.5 font-medium text-white hover:bg-copper-600"
        >
          Create a customer account
        </Link>
        <Link href="/billing" className="ml-4 text-tide-600 underline">
          Already a customer? Subscribe from your desk
        </Link>
      </p>
    </div>
  );
}
