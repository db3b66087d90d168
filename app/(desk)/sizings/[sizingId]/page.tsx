import type { Metadata } from 'next';
import Link from 'next/link';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { orNotFound, uuidOrNotFound } from '@/app/_components/route-guards';
import { requirePageUser } from '@/lib/auth/guards';
import { isStaff } from '@/lib/auth/roles';
import { getSizing } from '@/lib/sizings/queries';
import { KeyValueTable } from '../_components/key-value-table';
import { PreliminaryNote } from '../_components/preliminary-note';
import { SizingMeta } from '../_components/sizing-meta';

export const metadata: Metadata = { title: 'Sizing' };

export default async function SizingPage({ params }: { params: Promise<{ sizingId: string }> }) {
  const { sizingId: raw } = await params;
  const user = await requirePageUser(`/sizings/${raw}`, 'sizing:read');
  const sizingId = uuidOrNotFound(raw);
  const sizing = await orNotFound(getSizing(user, sizingId));
  return (
    <PageBody>
      <PageHeader eyebrow={<Link href="/sizings" className="underline">Sizings</Link>} title={sizing.title} description={`Sizing ${sizing.number} for ${sizing.accountName}`} />
      <PreliminaryNote />
      <Section title="Summary" id="summary">
        <SizingMeta sizing={sizing} linkAccount={isStaff(user.role) || user.accountId === sizing.accountId} />
      </Section>
      <div className="grid gap-6 xl:grid-cols-2">
        <Section title="Saved input" id="input">
          <KeyValueTable caption="Saved input" data={sizing.input} testId="sizing-input" />
        </Section>
        <Section title="Result at save time" id="result">
          <KeyValueTable caption="Result" data={sizing.result} testId="sizing-result" />
        </Section>
      </div>
    </PageBody>
  );
}
