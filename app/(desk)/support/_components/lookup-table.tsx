'use client';

import { createColumnHelper, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import Link from 'next/link';
import { useState } from 'react';
import type { SupportSearch } from '@/lib/support/schema';
import type { SupportHit, SupportResults } from '@/lib/support/search';
import { figure } from '@/lib/units';

const col = createColumnHelper<SupportHit>();

const columns = [
  col.accessor('number', {
    header: 'Sizing',
    cell: (c) => (
      <Link className="font-mono text-tide-700 underline" href={`/sizings/${c.row.original.id}`}>
        {c.getValue()}
      </Link>
    ),
  }),
  col.accessor('accountName', { header: 'Customer' }),
  col.accessor('equipmentTag', {
    header: 'Tag',
    cell: (c) => <span className="font-mono">{c.getValue() ?? '—'}</span>,
  }),
  col.accessor('title', { header: 'Title' }),
  col.accessor('service', { header: 'Service' }),
  col.accessor('gasLabel', { header: 'Gas' }),
  col.accessor('headlineKw', {
    header: 'kW',
    cell: (c) => <span className="tabular block text-right">{figure(c.getValue())}</span>,
  }),
  col.accessor('datasheetNumber', {
    header: 'Datasheet',
    cell: (c) => <span className="font-mono">{c.getValue() ?? '—'}</span>,
  }),
  col.accessor('quoteNumbers', {
    header: 'Quotes',
    cell: (c) => <span className="font-mono">{c.getValue().join(', ') || '—'}</span>,
  }),
  col.accessor('createdAt', { header: 'Saved (UTC)', cell: (c) => c.getValue().slice(0, 10) }),
];

/** Server-paginated results: the table shows one page, the pager asks the server for the next. */
export function LookupTable({
  data,
  query,
  update,
}: {
  data: SupportResults;
  query: SupportSearch;
  update: (p: Partial<SupportSearch>) => void;
}) {
  const table = useReactTable({
    data: data.hits,
    columns,
    getCoreRowModel: getCoreRowModel(),
    manualPagination: true,
    rowCount: data.total,
  });
  const pages = Math.max(1, Math.ceil(data.total / data.pageSize));
  // Keyset paging moves forward by cursor; the cursors of the pages already seen lead back.
  const [earlier, setEarlier] = useState<(string | undefined)[]>([]);
  return (
    <div>
      <div className="overflow-x-auto rounded-panel border border-paper-line bg-paper-raised">
        <table className="w-full text-left text-sm" data-testid="lookup-results">
          <thead className="bg-paper-sunk text-label text-ink-soft">
            {table.getHeaderGroups().map((hg) => (
              <tr key={hg.id}>
                {hg.headers.map((h) => (
                  <th key={h.id} scope="col" className="px-3 py-2 font-medium">
                    {flexRender(h.column.columnDef.header, h.getContext())}
                  </th>
                ))}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((r) => (
              <tr key={r.id} className="border-t border-paper-line hover:bg-paper/60" data-testid="lookup-row">
                {r.getVisibleCells().map((c) => (
                  <td key={c.id} className="px-3 py-2 align-top">
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {!data.hits.length && (
              <tr>
                <td colSpan={columns.length} className="px-3 py-6 text-center text-ink-muted">
                  No sizing matches. Try fewer words or clear a filter.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <nav aria-label="Result pages" className="mt-3 flex items-center gap-3 text-sm">
        <button
          type="button"
          className="rounded border border-paper-line px-3 py-1 disabled:opacity-50"
          disabled={query.page <= 1}
          onClick={() => {
            setEarlier((h) => h.slice(0, -1));
            update({ page: query.page - 1, cursor: earlier.at(-1) });
          }}
        >
          Previous
        </button>
        <span>
          Page {query.page} of {data.totalIsEstimate ? 'about ' : ''}
          {pages.toLocaleString('en-GB')}
        </span>
        <button
          type="button"
          className="rounded border border-paper-line px-3 py-1 disabled:opacity-50"
          disabled={!data.nextCursor}
          onClick={() => {
            setEarlier((h) => (query.page === 1 ? [undefined] : [...h, query.cursor]));
            update({ page: query.page + 1, cursor: data.nextCursor ?? undefined });
          }}
        >
          Next
        </button>
        <label className="ml-auto">
          Rows
          <select
            className="ml-2 rounded border border-paper-line px-2 py-1"
            value={query.pageSize}
            onChange={(e) => update({ pageSize: Number(e.target.value) })}
          >
            <option value={25}>25</option>
            <option value={50}>50</option>
            <option value={100}>100</option>
          </select>
        </label>
      </nav>
    </div>
  );
}
