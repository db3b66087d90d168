import type { Metadata } from 'next';
import Link from 'next/link';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { requirePageUser } from '@/lib/auth/guards';
import { AccountForm } from '../_components/account-form';

export const metadata: Metadata = { title: 'New customer account' };

export default async function NewAccountPage() {
  await requirePageUser('/accounts/new', 'account:manage');
  return (
    <PageBody>
      <PageHeader
        eyebrow={
          <Link href="/accounts" className="underline">
            Customer accounts
          </Link>
        }
        title="New customer account"
        description="A prospect’s company and site. Sizings, quotes and datasheets are saved against it; invite its people once it exists."
      />
      <Section title="Account details" id="account-details">
        <AccountForm mode={{ kind: 'create' }} />
      </Section>
    </PageBody>
  );
}
