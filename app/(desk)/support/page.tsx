import type { Metadata } from 'next';
import { requirePageUser } from '@/lib/auth/guards';
import { supportSearchSchema } from '@/lib/support/schema';
import { listStaffOptions } from '@/lib/support/options';
import { LookupDesk } from './_components/lookup-desk';

export const metadata: Metadata = { title: 'Look-up' };

export default async function SupportPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const user = await requirePageUser('/support', 'sizing:lookup');
  const raw = Object.fromEntries(Object.entries(await searchParams).map(([k, v]) => [k, Array.isArray(v) ? v[0] : v]));
  const initial = supportSearchSchema.parse(raw);
  const creators = await listStaffOptions();
  return (
    <main className="px-6 py-8">
      <h1 className="text-2xl font-semibold">Look-up</h1>
      <p className="mt-1 text-ink-soft" data-testid="lookup-scope">
        {user.role === 'sales_engineer'
          ? 'Find your customers’ sizings (accounts you opened, sized or quoted for)'
          : 'Find any sizing'}{' '}
        by datasheet or quote number, customer, equipment tag, title or notes. Close spellings match too.
      </p>
      <LookupDesk initial={initial} creators={creators} />
    </main>
  );
}
