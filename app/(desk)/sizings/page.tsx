import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/app/_components/empty-state';
import { PageBody, PageHeader } from '@/app/_components/page-header';
import { SizingsTable } from '@/app/_components/sizings/sizings-table';
import { buttonLinkClass } from '@/app/_components/submit-button';
import { requirePageUser } from '@/lib/auth/guards';
import { can, isStaff } from '@/lib/auth/roles';
import { listSizings } from '@/lib/sizings/queries';

export const metadata: Metadata = { title: 'Sizings' };

export default async function SizingsPage() {
  const user = await requirePageUser('/sizings', 'sizing:read');
  const sizings = await listSizings(user, { limit: 200 });
  const staff = isStaff(user.role);
  return (
    <PageBody>
      <PageHeader
        title="Saved sizings"
        description={
          staff ? 'The newest sizings saved to every customer account.' : 'Sizings saved to your customer account.'
        }
        actions={
          can(user.role, 'sizing:save') && (
            <Link href="/size" className={buttonLinkClass}>
              Size a duty
            </Link>
          )
        }
      />
      <SizingsTable
        sizings={sizings}
        hideAccount={!staff}
        empty={
          <EmptyState title="No saved sizings yet">
            Size a heater or compressor on the sizing desk and save it to a customer account.
          </EmptyState>
        }
      />
      {sizings.length >= 200 && <p className="text-sm text-ink-muted">Showing the newest 200.</p>}
    </PageBody>
  );
}
