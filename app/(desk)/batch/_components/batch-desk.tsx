'use client';

import { useMutation } from '@tanstack/react-query';
import { useRef, useState } from 'react';
import { BATCH_MAX_ROWS, parseBatchCsv, type ParsedSheet, type SheetRow } from '@/lib/batch/parse';
import { batchResultCsv } from '@/lib/batch/result-csv';
import type { BatchTarget } from '@/lib/batch/schema';
import { checkUpload, describeLimit } from '@/lib/batch/upload-limits';
import type { UnitSystem } from '@/lib/units';
import { apiError, checkInChunks, type Checked } from '../_lib/check-sheet';
import { BatchRowsTable } from './batch-rows-table';
import { BatchSavePanel } from './batch-save-panel';
import { CheckProgress } from './check-progress';

type Saved = { saved: number; quoteId: string | null; quoteNumber: string | null };

function download(name: string, text: string) {
  const url = URL.createObjectURL(new Blob([text], { type: 'text/csv' }));
  const a = Object.assign(document.createElement('a'), { href: url, download: name });
  a.click();
  URL.revokeObjectURL(url);
}

async function readSheet(file: File): Promise<ParsedSheet> {
  const check = checkUpload(file);
  if (!check.ok) return { rows: [], problems: [check.message] };
  return parseBatchCsv(await file.text());
}

/** Upload, check (in chunks, with progress), fix, check again and save exactly the rows that passed. */
export function BatchDesk(props: {
  accounts: { id: string; name: string; site?: string | null; billingContactEmail?: string | null }[];
  quotes: { id: string; number: string; title: string; accountId: string }[];
  canQuote: boolean;
  fixedAccountId: string | null;
  unitSystem: UnitSystem;
}) {
  const [file, setFile] = useState<File | null>(null);
  const [sheet, setSheet] = useState<ParsedSheet | null>(null);
  const [edits, setEdits] = useState<Record<number, Record<string, string>>>({});
  const [checked, setChecked] = useState<Checked | null>(null);
  const [progress, setProgress] = useState<{ done: number; total: number } | null>(null);
  const [checkError, setCheckError] = useState<string | null>(null);
  const abort = useRef<AbortController | null>(null);
  const save = useMutation({
    mutationFn: async (target: BatchTarget): Promise<Saved> => {
      const passed: SheetRow[] = checked!.rows.filter((r) => r.figures).map((r) => ({ row: r.row, cells: r.cells }));
      const body = new FormData();
      body.set('file', file!);
      body.set('rows', JSON.stringify(passed));
      body.set('target', JSON.stringify(target));
      const res = await fetch('/api/v1/batch/commit', { method: 'POST', body });
      if (!res.ok) throw await apiError(res);
      return res.json();
    },
  });

  const choose = async (next: File | null) => {
    abort.current?.abort();
    setFile(next);
    setEdits({});
    setChecked(null);
    setProgress(null);
    setCheckError(null);
    save.reset();
    setSheet(next ? await readSheet(next) : null);
  };

  const check = async () => {
    if (!sheet || sheet.problems.length) return;
    abort.current?.abort();
    const controller = new AbortController();
    abort.current = controller;
    const rows = sheet.rows.map((r) => ({ row: r.row, cells: { ...r.cells, ...edits[r.row] } }));
    setCheckError(null);
    save.reset();
    try {
      const result = await checkInChunks(rows, (done) => setProgress({ done, total: rows.length }), controller.signal);
      setChecked(result);
    } catch (err) {
      if (!controller.signal.aborted) setCheckError((err as Error).message);
    } finally {
      if (abort.current === controller) abort.current = null;
      setProgress(null);
    }
  };

  const checking = progress !== null;
  return (
    <div className="mt-6 space-y-5">
      <div className="flex flex-wrap items-end gap-3 rounded-panel border border-paper-line bg-paper-raised p-4">
        <label className="text-label">
          CSV file (up to {describeLimit()}, {BATCH_MAX_ROWS.toLocaleString('en-US')} rows)
          <input
            type="file"
            accept=".csv,text/csv"
            className="mt-1 block text-sm"
            data-testid="batch-file"
            onChange={(e) => void choose(e.target.files?.[0] ?? null)}
          />
        </label>
        <button
          type="button"
          disabled={!sheet || sheet.problems.length > 0 || checking}
          onClick={() => void check()}
          className="rounded-md bg-tide-600 px-4 py-2 text-white hover:bg-tide-700 disabled:opacity-50"
          data-testid="batch-check"
        >
          {checking ? 'Checking…' : checked ? 'Check again with my fixes' : 'Check the sheet'}
        </button>
        {checked && (
          <button
            type="button"
            onClick={() => download('dutywise-batch-results.csv', batchResultCsv(checked.rows))}
            className="ml-auto text-sm text-tide-700 underline"
            data-testid="batch-download"
          >
            Download results CSV
          </button>
        )}
      </div>
      {sheet && sheet.problems.length > 0 && (
        <p role="alert" data-testid="form-error" className="text-severity-danger">
          {sheet.problems.join(' ')}
        </p>
      )}
      {sheet && !sheet.problems.length && !checked && !checking && (
        <p className="text-sm text-ink-soft" data-testid="batch-read">
          {sheet.rows.length.toLocaleString('en-US')} duty points read; check them to size each one.
        </p>
      )}
      {progress && <CheckProgress {...progress} />}
      {checkError && (
        <p role="alert" data-testid="form-error" className="text-severity-danger">
          {checkError}
        </p>
      )}
      {checked && (
        <>
          <p className="text-sm" data-testid="batch-summary">
            {checked.sized} rows sized · {checked.withProblems} rows need attention ·{' '}
            {checked.rows.filter((r) => r.warnings.length).length} rows with warnings
          </p>
          <BatchRowsTable
            rows={checked.rows}
            edits={edits}
            unitSystem={props.unitSystem}
            onEdit={(row, col, v) => setEdits((e) => ({ ...e, [row]: { ...e[row], [col]: v } }))}
          />
          <BatchSavePanel
            {...props}
            sized={checked.sized}
            withProblems={checked.withProblems}
            pending={save.isPending}
            used={save.isSuccess}
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
