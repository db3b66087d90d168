'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import type { SizingInput, SizingResult } from '@/lib/engine';
import { CalculateError, postCalculate, type CalculateFailure } from '../_lib/calculate-client';

/** `value`, but only after it has held still for `delayMs`. */
function useDebounced<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(t);
  }, [value, delayMs]);
  return settled;
}

// Long enough to let a typed number settle (keys come about 150-250 ms apart), short enough that the answer
// lands within 400 ms of the last key.
export const DEBOUNCE_MS = 250;

export type LiveState = 'invalid' | 'computing' | 'recomputing' | 'ready' | 'error';

export type LiveResult = {
  state: LiveState;
  /** The answer on screen; during 'recomputing' it belongs to an older input and is shown dimmed. */
  result: SizingResult | null;
  /** The validated input `result` was computed for. */
  input: SizingInput | null;
  failure: CalculateFailure | null;
};

/**
 * The calculate API, called once the form has been valid and unchanged for DEBOUNCE_MS. Queries are keyed on
 * the normalised input, so an input seen before is answered from cache and an old answer can never
 * stand in for a newer input without being marked as such.
 */
export function useLiveResult(key: string | null): LiveResult {
  const settledKey = useDebounced(key, DEBOUNCE_MS);
  const query = useQuery({
    queryKey: ['calculate', settledKey],
    queryFn: async ({ signal }) => {
      // The answer travels with the input it answers, so a shown result always knows its input.
      const input = JSON.parse(settledKey!) as SizingInput;
      return { input, result: await postCalculate(input, signal) };
    },
    enabled: settledKey !== null,
    placeholderData: keepPreviousData,
    staleTime: Infinity,
    gcTime: 10 * 60_000,
    retry: (count, err) => err instanceof CalculateError && err.failure.kind === 'rate-limited' && count < 3,
    retryDelay: (_, err) =>
      err instanceof CalculateError && err.failure.kind === 'rate-limited' ? err.failure.retryAfterS * 1000 : 1000,
  });
  if (key === null) return { state: 'invalid', result: null, input: null, failure: null };
  const failure =
    query.error instanceof CalculateError ? query.error.failure : query.error ? ({ kind: 'network' } as const) : null;
  if (query.status === 'error' && settledKey === key) return { state: 'error', result: null, input: null, failure };
  if (!query.data) return { state: 'computing', result: null, input: null, failure: null };
  // Fresh only when the answer is for the input on screen now, not a placeholder or a settling edit.
  const fresh = !query.isPlaceholderData && settledKey === key && !query.isFetching;
  return { state: fresh ? 'ready' : 'recomputing', result: query.data.result, input: query.data.input, failure: null };
}
