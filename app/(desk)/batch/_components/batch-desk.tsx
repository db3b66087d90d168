'use client';

import { useMutation } from '@tanstack/react-query';
import { useState } from 'react';
import type { BatchRow } from '@/lib/batch/evaluate';
import { batchResultCsv } from '@/lib/batch/result-csv';
import type { BatchTarget } from '@/lib/batch/schema';
import { BatchRowsTable } from './batch-rows-table';
import { BatchSavePanel } from './batch-save-panel';

type Preview = { rows: BatchRow[]; sized: number; withProblems: number };

async function post(url: string, file: File, extra: Record<string, string>): Promise<unknown> {
  const body = new FormData();
  body.set('file', file);
  for (const [k, v] of Object.entries(extra)) body.set(k, v);
  const res = await fetch(url, { method: 'POST', body });
  const json = await res.json().catch(() => null);
  if (!res.ok)
    throw new Error(
      (json as { errors?: { message: string }[] })?.errors?.map((e) => e.message).join(' ') ??
        `Request failed (${res.status})`,
    );
  return json;
}

function download(name: string, text: string) {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv' }));
  const a = Object.assign(document.createElement('a'), { href: url, download: name });
  a.click();
  URL.revokeObjectURL(url);
}

/** Upload, check, fix, re-check and confirm a sheet of duty points. */
export function BatchDesk(props: {
  accounts: { id: string; name: string; site?: string | null; billingContactEmail?: string | null }[];
  quotes: { id: string; number: string; title: string; accountId: string }[];
  canQuote: boolean;
  fixedAccountId: string | null;
}) {
  const [file, setFile] = useState<File | null>(null);
  const [edits, setEdits] = useState<Record<number, Record<string, string>>>({});
  const check = useMutation({
    mutationFn: (rows?: BatchRow[]) =>
      post(
        '/api/v1/batch/preview',
        file!,
        rows ? { rows: JSON.stringify(rows.map((r) => ({ ...r.cells, ...edits[r.row] }))) } : {},
      ) as Promise<Preview>,
  });
  const save = useMutation({
    mutationFn: (target: BatchTarget) =>
      post('/api/v1/batch/commit', file!, {
        rows: JSON.stringify(check.data!.rows.map((r) => ({ ...r.cells, ...edits[r.row] }))),
        target: JSON.stringify(target),
      }) as Promise<{ saved: number; quoteId: string | null; quoteNumber: string | null }>,
  });
  const preview = check.data;
  return (
    <div className="mt-6 space-y-5">
      <div className="flex flex-wrap items-end gap-3 rounded-panel border border-paper-line bg-paper-raised p-4">
        <label className="text-label">
          CSV file (up to 2 MiB, 2,000 rows)
          <input
            type="file"
            accept=".csv,text/csv"
            className="mt-1 block text-sm"
            data-testid="batch-file"
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null);
              setEdits({});
              check.reset();
              save.reset();
            }}
          />
        </label>
        <button
          type="button"
          disabled={!file || check.isPending}
          onClick={() => check.mutate(undefined)}
          className="rounded-md bg-tide-600 px-4 py-2 text-white hover:bg-tide-700 disabled:opacity-50"
          data-testid="batch-check"
        >
          {check.isPending ? 'Checking…' : 'Check the sheet'}
        </button>
        {preview && Object.keys(edits).length > 0 && (
          <button
            type="button"
            onClick={() => check.mutate(preview.rows)}
            className="rounded-md border border-tide-600 px-4 py-2 text-tide-700"
          >
            Re-check with my fixes
          </button>
        )}
        {preview && (
          <button
            type="button"
            onClick={() => download('dutywise-batch-results.csv', batchResultCsv(preview.rows))}
            className="ml-auto text-sm text-tide-700 underline"
            data-testid="batch-download"
          >
            Download results CSV
          </button>
        )}
      </div>
      {check.isError && (
        <p role="alert" data-testid="form-error" className="text-severity-danger">
          {(check.error as Error).message}
        </p>
      )}
      {preview && (
        <>
          <p className="text-sm" data-testid="batch-summary">
            {preview.sized} rows sized · {preview.withProblems} rows need attention
          </p>
          <BatchRowsTable
            rows={preview.rows}
            edits={edits}
            onEdit={(row, col, v) => setEdits((e) => ({ ...e, [row]: { ...e[row], [col]: v } }))}
          />
          <BatchSavePanel
            {...props}
            sized={preview.sized}
            withProblems={preview.withProblems}
            pending={save.isPending}
            onSave={(t) => save.mutate(t)}
          />
        </>
      )}
      {save.isError && (
        <p role="alert" data-testid="form-error" className="text-severity-danger">
          {(save.error as Error).message}
        </p>
      )}
      {save.data && (
        <p className="rounded-md bg-tide-50 p-3" role="status" data-testid="batch-saved">
          Saved {save.data.saved} sizings{save.data.quoteNumber ? ` to quote ${save.data.quoteNumber}` : ''}.{' '}
          {save.data.quoteId && (
            <a className="text-tide-700 underline" href={`/quotes/${save.data.quoteId}`}>
              Open the quote
            </a>
          )}
        </p>
      )}
    </div>
  );
}
