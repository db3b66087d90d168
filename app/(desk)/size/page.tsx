import type { Metadata } from 'next';
import { firstParam, type SearchParams } from '@/app/_components/route-guards';
import { listAccountOptions } from '@/lib/accounts/queries';
import { getCurrentUser } from '@/lib/auth/current-user';
import { can, isStaff, roleLabels } from '@/lib/auth/roles';
import { listOpenQuotes } from '@/lib/quotes/queries';
import { PA_PER_PSI, systemOfUnits } from '@/lib/units';
import { SizingDesk } from './_components/sizing-desk';
import { defaultValues } from './_lib/defaults';
import { valuesFromInput } from './_lib/from-request';
import { loadDeskStart } from './_lib/load-desk';
import { sitePressureOf } from './_lib/site-pressure';

export const metadata: Metadata = { title: 'Sizing desk' };

// Open to everyone: prospects size without signing in; saving needs an account and the right role.
export default async function SizePage({ searchParams }: { searchParams: SearchParams }) {
  const sp = await searchParams;
  const user = await getCurrentUser();
  const canSave = !!user && can(user.role, 'sizing:save');
  const canQuote = !!user && can(user.role, 'quote:manage');
  const [accounts, quotes, start] = await Promise.all([
    user && canSave ? listAccountOptions(user) : Promise.resolve([]),
    user && canQuote ? listOpenQuotes(user) : Promise.resolve([]),
    loadDeskStart(user, {
      sizing: firstParam(sp.sizing),
      revise: firstParam(sp.revise),
      i: firstParam(sp.i),
      from: firstParam(sp.from),
    }),
  ]);
  // A saved preference wins; a prospect opening a link sees it in the units it was made in.
  const i = start.input;
  const system =
    user?.unitSystem ?? (i ? systemOfUnits([i.flow.unit, i.inlet.temperature.unit, i.inlet.pressure.unit]) : 'si');
  const opened = start.input ? valuesFromInput(start.input, system) : { values: defaultValues(system), dropped: [] };
  const values = opened.values;
  const customerAccountId = user && !isStaff(user.role) ? user.accountId : null;
  values.accountId = start.reopened?.accountId ?? customerAccountId ?? '';
  // A new sizing for a known account starts from that site's pressure; reopened inputs keep their own.
  const account = accounts.find((a) => a.id === values.accountId);
  if (!start.input && account) {
    const kpa = sitePressureOf(account).kpa;
    // In the system's barometric unit: a US customary desk shows psia, not kPa.
    values.site.barometricPressure =
      system === 'us'
        ? { value: String(Number(((kpa * 1000) / PA_PER_PSI).toFixed(3))), unit: 'psia' }
        : { value: String(kpa), unit: 'kPa' };
  }
  const notices = [...start.notices];
  if (opened.dropped.length)
    notices.push(`Inputs the desk has no field for were left out: ${opened.dropped.join(', ')}.`);
  return (
    <SizingDesk
      initialValues={values}
      system={system}
      viewer={{
        signedIn: !!user,
        roleLabel: user ? roleLabels[user.role] : null,
        canSave,
        canQuote,
        customerAccountId,
      }}
      accounts={accounts}
      quotes={quotes}
      reopened={start.reopened}
      notices={notices}
    />
  );
}
