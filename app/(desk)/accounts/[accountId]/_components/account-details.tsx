import type { AccountDetail } from '@/lib/accounts/queries';
import { FactList } from '@/app/_components/fact-list';

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
  return <FactList rows={rows} testId="account-details" />;
}
