import type { AccountDetail } from '@/lib/accounts/queries';

function siteAtmosphere(a: AccountDetail): string {
  if (a.barometricPressureKpa !== null) return `${a.barometricPressureKpa} kPa barometric`;
  if (a.siteAltitudeM !== null) return `${a.siteAltitudeM} m altitude (ISO 2533 standard atmosphere)`;
  return 'Not given: 101.325 kPa is assumed';
}

/** The account's identity, billing contact and site atmosphere as a definition list. */
export function AccountDetails({ account }: { account: AccountDetail }) {
  const rows: [string, string][] = [
    ['Company', account.name],
    ['Site', account.site ?? '—'],
    ['Billing contact', account.billingContactName ?? '—'],
    ['Billing contact e-mail', account.billingContactEmail ?? 'None: quotes cannot be sent until one is added'],
    ['Site atmosphere', siteAtmosphere(account)],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[max-content_1fr]" data-testid="account-details">
      {rows.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-muted">{k}</dt>
          <dd className="tabular text-ink">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
