import type { SizingInput, SizingIssue, SizingResult } from '@/lib/engine';

export type CalculateFailure =
  | { kind: 'input'; issues: SizingIssue[] }
  | { kind: 'rate-limited'; retryAfterS: number }
  | { kind: 'too-large' }
  | { kind: 'server'; status: number }
  | { kind: 'network' };

/** A refused or failed call of the calculate API, as data the desk can explain. */
export class CalculateError extends Error {
  constructor(readonly failure: CalculateFailure) {
    super(`calculate failed: ${failure.kind}`);
    this.name = 'CalculateError';
  }
}

export const CALCULATE_PATH = '/api/v1/calculate';

/** POSTs one validated input to the public calculate API. */
export async function postCalculate(input: SizingInput, signal?: AbortSignal): Promise<SizingResult> {
  let res: Response;
  try {
    res = await fetch(CALCULATE_PATH, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(input),
      signal,
    });
  } catch (err) {
    if (signal?.aborted) throw err;
    throw new CalculateError({ kind: 'network' });
  }
  if (res.ok) return (await res.json()) as SizingResult;
  if (res.status === 400 || res.status === 422) {
    const body = (await res.json().catch(() => null)) as { errors?: SizingIssue[] } | null;
    throw new CalculateError({
      kind: 'input',
      issues: body?.errors ?? [{ path: '', message: 'the calculator refused this input' }],
    });
  }
  if (res.status === 429) {
    const retry = Number(res.headers.get('retry-after'));
    throw new CalculateError({ kind: 'rate-limited', retryAfterS: Number.isFinite(retry) && retry > 0 ? retry : 5 });
  }
  if (res.status === 413) throw new CalculateError({ kind: 'too-large' });
  throw new CalculateError({ kind: 'server', status: res.status });
}

/** How a failure reads in the result panel. */
export function failureText(f: CalculateFailure): string {
  switch (f.kind) {
    case 'input':
      return 'The calculator refused this duty point; see the fields marked.';
    case 'rate-limited':
      return `Too many calculations in a short time; the desk retries in ${f.retryAfterS} s.`;
    case 'too-large':
      return 'The request is too large for the calculator (shorten the catalogue rating list).';
    case 'server':
      return `The calculator answered with an error (HTTP ${f.status}). Try again in a moment.`;
    case 'network':
      return 'The calculator could not be reached; check the connection. The desk retries when inputs change.';
  }
}
