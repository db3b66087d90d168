import type { Issue } from '../errors';

/** One refused field: dotted path into the request ("" for the whole body) and why, with the allowed range. */
export type SizingIssue = Issue;

/**
 * Thrown by `calculate` for any input it refuses; `issues` lists every bad field found. The engine stays
 * framework-free: route handlers and the action wrapper turn this into the shared AppError.
 */
export class SizingInputError extends Error {
  readonly issues: SizingIssue[];
  constructor(issues: SizingIssue[]) {
    const first = issues[0];
    super(
      first
        ? `invalid sizing input: ${first.path || '(body)'}: ${first.message}${issues.length > 1 ? ` (+${issues.length - 1} more)` : ''}`
        : 'invalid sizing input',
    );
    this.name = 'SizingInputError';
    this.issues = issues;
  }
}
