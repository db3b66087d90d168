'use client';

import type { SupportSearch } from '@/lib/support/schema';

type Props = {
  query: SupportSearch;
  update: (p: Partial<SupportSearch>) => void;
  creators: { id: string; name: string }[];
};

const field = 'mt-1 rounded-md border border-paper-line bg-paper-raised px-2 py-1.5 text-sm';
const gases = [
  'air',
  'humid-air',
  'nitrogen',
  'oxygen',
  'argon',
  'helium',
  'carbon-dioxide',
  'hydrogen',
  'methane',
  'natural-gas',
  'ethane',
  'propane',
  'carbon-monoxide',
  'ammonia',
  'steam',
  'mixture',
];

/** Narrowing filters: service, gas, duty range, dates, creator, quote status and sort. */
export function LookupFilters({ query, update, creators }: Props) {
  const num = (v: string) => (v === '' ? undefined : Number(v));
  return (
    <fieldset className="flex flex-wrap gap-3 rounded-panel border border-paper-line bg-paper-raised p-3">
      <legend className="px-1 text-label text-ink-soft">Narrow</legend>
      <label className="text-label">
        Service
        <select
          className={`${field} block`}
          value={query.service ?? ''}
          onChange={(e) => update({ service: (e.target.value || undefined) as SupportSearch['service'] })}
          data-testid="filter-service"
        >
          <option value="">Any</option>
          <option value="heater">Heater</option>
          <option value="compressor">Compressor</option>
        </select>
      </label>
      <label className="text-label">
        Gas
        <select
          className={`${field} block`}
          value={query.gas ?? ''}
          onChange={(e) => update({ gas: e.target.value || undefined })}
          data-testid="filter-gas"
        >
          <option value="">Any</option>
          {gases.map((g) => (
            <option key={g} value={g}>
              {g.replace(/-/g, ' ')}
            </option>
          ))}
        </select>
      </label>
      <label className="text-label">
        kW from
        <input
          type="number"
          min={0}
          className={`${field} block w-24`}
          value={query.minKw ?? ''}
          onChange={(e) => update({ minKw: num(e.target.value) })}
        />
      </label>
      <label className="text-label">
        kW to
        <input
          type="number"
          min={0}
          className={`${field} block w-24`}
          value={query.maxKw ?? ''}
          onChange={(e) => update({ maxKw: num(e.target.value) })}
        />
      </label>
      <label className="text-label">
        Saved from
        <input
          type="date"
          className={`${field} block`}
          value={query.from ?? ''}
          onChange={(e) => update({ from: e.target.value || undefined })}
          data-testid="filter-from"
        />
      </label>
      <label className="text-label">
        Saved to
        <input
          type="date"
          className={`${field} block`}
          value={query.to ?? ''}
          onChange={(e) => update({ to: e.target.value || undefined })}
          data-testid="filter-to"
        />
      </label>
      <label className="text-label">
        Created by
        <select
          className={`${field} block`}
          value={query.creator ?? ''}
          onChange={(e) => update({ creator: e.target.value || undefined })}
        >
          <option value="">Anyone</option>
          {creators.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </select>
      </label>
      <label className="text-label">
        Quote status
        <select
          className={`${field} block`}
          value={query.quoteStatus ?? ''}
          onChange={(e) => update({ quoteStatus: (e.target.value || undefined) as SupportSearch['quoteStatus'] })}
        >
          <option value="">Any</option>
          <option value="draft">Draft</option>
          <option value="sent">Sent</option>
          <option value="won">Won</option>
          <option value="lost">Lost</option>
        </select>
      </label>
      <label className="text-label">
        Sort
        <select
          className={`${field} block`}
          value={query.sort ?? ''}
          onChange={(e) => update({ sort: (e.target.value || undefined) as SupportSearch['sort'] })}
        >
          <option value="">{query.q ? 'Best match (text typed)' : 'Newest first (no text typed)'}</option>
          <option value="newest">Newest first</option>
          <option value="oldest">Oldest first</option>
          <option value="largest">Largest kW</option>
          <option value="smallest">Smallest kW</option>
          <option value="relevance">Best match</option>
        </select>
      </label>
    </fieldset>
  );
}
