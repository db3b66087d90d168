import type { Metadata } from 'next';
import Link from 'next/link';
import { EmptyState } from '@/app/_components/empty-state';
import { FactList } from '@/app/_components/fact-list';
import { PageBody, PageHeader, Section } from '@/app/_components/page-header';
import { QuotesTable } from '@/app/_components/quotes/quotes-table';
import { orNotFound, uuidOrNotFound } from '@/app/_components/route-guards';
import { SizingsTable } from '@/app/_components/sizings/sizings-table';
import { SubscriptionBadge } from '@/app/_components/status-badge';
import { buttonLinkClass } from '@/app/_components/submit-button';
import { getAccount, type AccountDetail } from '@/lib/accounts/queries';
import { requirePageUser } from '@/lib/auth/guards';
import { can } from '@/lib/auth/roles';
import { PA_PER_PSI } from '@/lib/units';
import { listQuotes } from '@/lib/quotes/queries';
import { listSizings } from '@/lib/sizings/queries';
import { AccountForm } from '../_components/account-form';
import { MembersPanel } from './_components/members-panel';

const KPA_PER_PSI = PA_PER_PSI / 1000;

function siteAtmosphere(a: AccountDetail): string {
  if (a.barometricPressureKpa !== null)
    return a.unitSystem === 'us'
      ? `${(a.barometricPressureKpa / KPA_PER_PSI).toFixed(2)} psia barometric`
      : `${a.barometricPressureKpa} kPa barometric`;
  if (a.siteAltitudeM !== null) return `${a.siteAltitudeM} m altitude (ISO 2533 standard atmosphere)`;
  return 'Not given: 101.325 kPa is assumed';
}

/** The account's identity, billing contact and site atmosphere as a definition list. */
function AccountDetails({ account }: { account: AccountDetail }) {
  const rows: [string, string][] = [
    ['Company', account.name],
    ['Site', account.site ?? '—'],
    ['Billing contact', account.billingContactName ?? '—'],
    ['Billing contact e-mail', account.billingContactEmail ?? 'None: quotes cannot be sent until one is added'],
    ['Site atmosphere', siteAtmosphere(account)],
    ['Units', account.unitSystem === 'us' ? 'US customary (°F, psia/psig, lb/h)' : 'SI (°C, kPa/bar, kg/h)'],
    ['Quote currency', account.currency],
  ];
  return (
    <>
      <FactList rows={rows} testId="account-details" />
      <dl className="mt-3 flex flex-wrap gap-x-6 gap-y-1 text-sm" data-testid="account-figures">
        <div className="flex items-center gap-2">
          <dt className="text-ink-muted">Subscription</dt>
          <dd>
            <SubscriptionBadge state={account.subscription} />
          </dd>
        </div>
        <div className="flex gap-2">
          <dt className="text-ink-muted">Members</dt>
          <dd data-testid="account-member-count">{account.memberCount}</dd>
        </div>
        <div className="flex gap-2">
          <dt className="text-ink-muted">Quotes</dt>
          <dd data-testid="account-quote-count">{account.quoteCount}</dd>
        </div>
        <div className="flex gap-2">
          <dt className="text-ink-muted">Sizings</dt>
          <dd data-testid="account-sizing-count">{account.sizingCount}</dd>
        </div>
      </dl>
    </>
  );
}

export const metadata: Metadata = { title: 'Customer account' };

function formValues(a: AccountDetail) {
  return {
    name: a.name,
    site: a.site ?? '',
    billingContactName: a.billingContactName ?? '',
    billingContactEmail: a.billingContactEmail ?? '',
    barometricPressureKpa:
      a.barometricPressureKpa === null || a.unitSystem === 'us' ? '' : String(a.barometricPressureKpa),
    barometricPressurePsia:
      a.barometricPressureKpa === null || a.unitSystem !== 'us'
        ? ''
        : String(Number((a.barometricPressureKpa / KPA_PER_PSI).toFixed(3))),
    siteAltitudeM: a.siteAltitudeM === null ? '' : String(a.siteAltitudeM),
    unitSystem: a.unitSystem,
    currency: a.currency,
  };
}

export default async function AccountPage({ params }: { params: Promise<{ accountId: string }> }) {
  const { accountId: raw } = await params;
  const user = await requirePageUser(`/accounts/${raw}`, 'account:read');
  const accountId = uuidOrNotFound(raw);
  const account = await orNotFound(getAccount(user, accountId));
  const mayManage = can(user.role, 'account:manage');
  const mayQuote = can(user.role, 'quote:manage');
  const [quotes, sizings] = await Promise.all([
    can(user.role, 'quote:read') ? listQuotes(user, { accountId }) : Promise.resolve([]),
    can(user.role, 'sizing:read') ? listSizings(user, { accountId, limit: 100 }) : Promise.resolve([]),
  ]);

  return (
    <PageBody>
      <PageHeader
        eyebrow={
          <Link href="/accounts" className="underline">
            Customer accounts
          </Link>
        }
        title={account.name}
        description={account.site ?? undefined}
        actions={
          mayQuote && (
            <Link href={`/quotes/new?accountId=${account.id}`} className={buttonLinkClass}>
              New quote for this account
            </Link>
          )
        }
      />
      <Section title="Details" id="details">
        <AccountDetails account={account} />
        {mayManage && (
          <details className="mt-4 rounded-md border border-paper-line p-3">
            <summary className="cursor-pointer text-sm font-medium text-tide-600">Edit details</summary>
            <div className="mt-4">
              <AccountForm mode={{ kind: 'edit', accountId: account.id }} initial={formValues(account)} />
            </div>
          </details>
        )}
      </Section>
      <Section title="People" id="people">
        <MembersPanel account={account} mayInvite={can(user.role, 'member:invite')} />
      </Section>
      <Section title="Quotes" id="quotes">
        <QuotesTable quotes={quotes} hideAccount empty={<EmptyState title="No quotes for this account yet" />} />
      </Section>
      <Section title="Saved sizings" id="sizings">
        <SizingsTable
          sizings={sizings}
          hideAccount
          empty={
            <EmptyState title="No sizings saved to this account yet">
              Size a heater or compressor and save it here.
            </EmptyState>
          }
        />
      </Section>
    </PageBody>
  );
}
