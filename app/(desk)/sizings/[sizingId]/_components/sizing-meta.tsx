import { EQUATION_NAMES } from '@/lib/engine/headline-method';
import Link from 'next/link';
import type { ReactNode } from 'react';
import { tableLinkClass } from '@/app/_components/data-table';
import { FactList } from '@/app/_components/fact-list';
import { formatDateTime } from '@/app/_components/format';
import { ServiceBadge } from '@/app/_components/status-badge';
import { formatHeadline } from '@/lib/sizings/headline';
import type { SizingDetail } from '@/lib/sizings/queries';

/** The saved sizing's identity and headline as a definition list. */
export function SizingMeta({ sizing, linkAccount }: { sizing: SizingDetail; linkAccount: boolean }) {
  const rows: [string, ReactNode][] = [
    [
      'Sizing number',
      <span key="n" className="font-mono" data-testid="sizing-number">
        {sizing.number}
      </span>,
    ],
    [
      'Version',
      <span key="v" data-testid="sizing-version">
        {sizing.revision}
      </span>,
    ],
    [
      'Equipment tag',
      sizing.equipmentTag ? (
        <span key="t" className="font-mono">
          {sizing.equipmentTag}
        </span>
      ) : (
        '—'
      ),
    ],
    [
      'Customer account',
      linkAccount ? (
        <Link key="a" href={`/accounts/${sizing.accountId}`} className={tableLinkClass}>
          {sizing.accountName}
        </Link>
      ) : (
        sizing.accountName
      ),
    ],
    ['Service', <ServiceBadge key="s" service={sizing.service} />],
    ['Gas', sizing.gasLabel],
    [
      'Headline',
      <strong key="h" className="tabular">
        {formatHeadline(sizing.service, sizing.headlineKw)}
      </strong>,
    ],
    ['Created by', sizing.createdByName ?? '—'],
    ['Created', formatDateTime(sizing.createdAt)],
    ['Equation of state', <span key="q">{equationOf(sizing.result)}</span>],
    ...(sizing.revision > 1
      ? ([['Current version saved', `${formatDateTime(sizing.updatedAt)} by ${sizing.updatedByName ?? '—'}`]] as [
          string,
          ReactNode,
        ][])
      : []),
    [
      'Engine version',
      <span key="e" className="font-mono">
        {sizing.engineVersion}
      </span>,
    ],
  ];
  return <FactList rows={rows} testId="sizing-meta" notes={sizing.notes} />;
}

/** The equation of state a saved result was sized on; results from before real-gas sizing were ideal gas. */
function equationOf(result: unknown): string {
  const basis = (result as { basis?: { equationOfState?: unknown } } | null)?.basis;
  const id = basis?.equationOfState;
  if (id === 'gerg-2008' || id === 'peng-robinson' || id === 'ideal-gas') return EQUATION_NAMES[id];
  return 'ideal gas (sized before real-gas properties were offered)';
}
