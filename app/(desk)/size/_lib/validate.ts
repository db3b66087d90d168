import { sizingRequestSchema, type SizingInput, type SizingRequest } from '@/lib/engine/schema';
import { issuesOf } from '@/lib/errors';
import { groupIssues, type DeskIssues } from './field-paths';
import { numberEntryIssues } from './number-entry';
import type { DeskValues } from './form-types';
import { toRequest } from './to-request';

export type DeskValidation =
  | { ok: true; request: SizingRequest; input: SizingInput; key: string }
  | { ok: false; request: SizingRequest; issues: DeskIssues };

/** Runs the engine's own schema over the form: the normalised input and its cache key, or every issue by field. */
export function validateDesk(values: DeskValues): DeskValidation {
  const request = toRequest(values);
  const ambiguous = numberEntryIssues(values, values.service);
  const parsed = sizingRequestSchema.safeParse(request);
  if (!parsed.success || Object.keys(ambiguous).length) {
    const issues = parsed.success ? { fields: {}, general: [] } : groupIssues(issuesOf(parsed.error), values.service);
    return { ok: false, request, issues: { ...issues, fields: { ...issues.fields, ...ambiguous } } };
  }
  // Numbers coerced, units canonical, defaults filled: equal inputs give equal keys whatever was typed.
  return { ok: true, request, input: parsed.data, key: JSON.stringify(parsed.data) };
}
