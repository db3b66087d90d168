import { issuesOf } from '../errors';
import { calculateCore } from './calculate-core';
import { SizingInputError } from './input-error';
import type { SizingResult } from './result-types';
import { sizingRequestSchema } from './schema';

/** Validates `input` against the request schema and sizes it; throws SizingInputError listing every bad field. */
export function calculate(input: unknown): SizingResult {
  if (typeof input !== 'object' || input === null || Array.isArray(input)) {
    throw new SizingInputError([
      { path: '', message: 'the request must be a JSON object with a "service" field ("heater" or "compressor")' },
    ]);
  }
  const parsed = sizingRequestSchema.safeParse(input);
  if (!parsed.success) throw new SizingInputError(issuesOf(parsed.error));
  return calculateCore(parsed.data);
}
