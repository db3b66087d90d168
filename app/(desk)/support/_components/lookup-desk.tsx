'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import type { SupportSearch } from '@/lib/support/schema';
import type { SupportResults } from '@/lib/support/search';
import { LookupFilters } from './lookup-filters';
import { LookupTable } from './lookup-table';
import { toSearchParams, useUrlQuery } from './use-url-query';

async function fetchResults(q: SupportSearch): Promise<SupportResults> {
  const res = await fetch(`/api/v1/support/search?${toSearchParams(q)}`);
  const body = await res.json();
  if (!res.ok) throw new Error(body?.errors?.[0]?.message ?? `Look-up failed (${res.status})`);
  return body as SupportResults;
}

const count = new Intl.NumberFormat('en-GB');

function countLabel(r: SupportResults): string {
  const n = count.format(r.total);
  return r.totalIsEstimate ? `about ${n} sizings` : `${n} ${r.total === 1 ? 'sizing' : 'sizings'}`;
}

/** Search box, filters and the paged results table; results follow the filters as they change. */
export function LookupDesk({
  initial,
  creators,
}: {
  initial: SupportSearch;
  creators: { id: string; name: string }[];
}) {
  const [query, update] = useUrlQuery(initial);
  const [text, setText] = useState(initial.q ?? '');
  useEffect(() => {
    const t = setTimeout(() => {
      if ((query.q ?? '') !== text.trim()) update({ q: text.trim() || undefined });
    }, 250);
    return () => clearTimeout(t);
  }, [text, query.q, update]);
  const results = useQuery({
    queryKey: ['support-search', query],
    queryFn: () => fetchResults(query),
    placeholderData: keepPreviousData,
  });
  return (
    <div className="mt-6 space-y-4">
      <div className="flex flex-wrap items-end gap-3">
        <label className="min-w-72 flex-1">
          <span className="block text-label text-ink-soft">Search</span>
          <input
            type="search"
            value={text}
            onChange={(e) => setText(e.target.value)}
            placeholder="DS26-0501, Q26-0101, Tarnside, EH-301, dryer…"
            className="mt-1 w-full rounded-md border border-paper-line bg-paper-raised px-3 py-2 text-base"
            data-testid="lookup-search"
            aria-describedby="lookup-hint"
          />
          <span id="lookup-hint" className="text-hint text-ink-muted">
            Numbers, customer, tag, title or notes; partial words and small typos match.
          </span>
        </label>
        <a
          className="rounded-md border border-tide-600 px-3 py-2 text-sm text-tide-700 hover:bg-tide-50"
          href={`/api/v1/support/export?${toSearchParams(query)}`}
          data-testid="lookup-export"
        >
          Export CSV
        </a>
      </div>
      <LookupFilters query={query} update={update} creators={creators} />
      <p className="text-sm text-ink-muted" aria-live="polite" data-testid="lookup-count">
        {results.isError
          ? (results.error as Error).message
          : results.data
            ? `${countLabel(results.data)}${results.data.closeMatches ? ', including close spellings' : ''}${results.isFetching ? ' · updating…' : ''}`
            : 'Searching…'}
      </p>
      {results.data && <LookupTable data={results.data} query={query} update={update} />}
    </div>
  );
}
