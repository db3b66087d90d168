import Link from 'next/link';
import { SelectField } from '@/app/_components/select-field';
import { quoteStatusLabels } from '@/app/_components/status-badge';
import { TextField } from '@/app/_components/text-field';
import { quoteStatuses, type QuoteFilter } from '@/lib/quotes/schema';
import { accountOptionLabel } from '@/lib/accounts/label';

type Props = {
  filter: QuoteFilter;
  accounts: { id: string; name: string; site?: string | null; billingContactEmail?: string | null }[] | null;
};

/** Filters held in the URL (a plain GET form), so a filtered list can be bookmarked or shared. */
export function QuoteFilters({ filter, accounts }: Props) {
  const statusOptions = quoteStatuses.map((s) => ({ value: s, label: quoteStatusLabels[s] ?? s }));
  return (
    <form
      method="get"
      action="/quotes"
      role="search"
      aria-label="Filter quotes"
      className="flex flex-wrap items-end gap-3 rounded-panel border border-paper-line bg-paper-raised p-3"
    >
      <TextField
        label="Search number, title or account"
        name="q"
        type="search"
        defaultValue={filter.q ?? ''}
        className="min-w-56 flex-1"
      />
      <SelectField
        label="Status"
        name="status"
        options={statusOptions}
        placeholder="Any status"
        defaultValue={filter.status ?? ''}
        className="w-40"
      />
      {accounts && (
        <SelectField
          label="Customer account"
          name="accountId"
          options={accounts.map((a) => ({ value: a.id, label: accountOptionLabel(a) }))}
          placeholder="Any account"
          defaultValue={filter.accountId ?? ''}
          className="w-56"
        />
      )}
      <button
        type="submit"
        className="rounded-md bg-tide-600 px-4 py-2 text-sm font-medium text-white hover:bg-tide-700"
      >
        Apply filters
      </button>
      <Link href="/quotes" className="px-2 py-2 text-sm text-tide-600 underline">
        Clear
      </Link>
    </form>
  );
}
