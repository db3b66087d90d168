import { BATCH_CHECK_CHUNK, type SheetRow } from '@/lib/batch/parse';
import type { BatchRowView } from '@/lib/batch/view';

export type Checked = { rows: BatchRowView[]; sized: number; withProblems: number };

/** The first error message of a failed API answer. */
export async function apiError(res: Response): Promise<Error> {
  const json = (await res.json().catch(() => null)) as { errors?: { message: string }[] } | null;
  return new Error(json?.errors?.map((e) => e.message).join(' ') ?? `Request failed (${res.status})`);
}

/**
 * Checks the rows chunk by chunk (the engine sizes a few thousand rows a second), reporting how many are done
 * after each chunk; stops early when `signal` aborts.
 */
export async function checkInChunks(
  rows: readonly SheetRow[],
  onProgress: (done: number) => void,
  signal?: AbortSignal,
): Promise<Checked> {
  const out: BatchRowView[] = [];
  onProgress(0);
  for (let i = 0; i < rows.length; i += BATCH_CHECK_CHUNK) {
    const chunk = rows.slice(i, i + BATCH_CHECK_CHUNK);
    const res = await fetch('/api/v1/batch/preview', {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ rows: chunk }),
      signal,
    });
    if (!res.ok) throw await apiError(res);
    out.push(...((await res.json()) as { rows: BatchRowView[] }).rows);
    onProgress(out.length);
  }
  return {
    rows: out,
    sized: out.filter((r) => r.figures).length,
    withProblems: out.filter((r) => r.problems.length).length,
  };
}
