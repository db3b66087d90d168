// The one error model. Every layer throws AppError; its code decides the HTTP status, and handlers and
// actions answer with the same list of { path, message }. Pure: no framework, database or React code,
// so the sizing engine may use issuesOf too.
import type * as zc from 'zod/v4/core';
import * as z from 'zod/mini';
import '@/lib/validation/english-messages';

/** One problem: dotted path into the request ("" for the request as a whole) and what is wrong with it. */
export type Issue = { path: string; message: string };

/** The body of every failed answer, from a route handler or (with ok and status) a server action. */
export type ErrorBody = { errors: Issue[] };

const STATUS = {
  invalid_input: 400,
  unauthenticated: 401,
  payment_required: 402,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  too_large: 413,
  unsupported_type: 415,
  unprocessable: 422,
  rate_limited: 429,
  internal: 500,
  upstream_failed: 502,
  unavailable: 503,
} as const;

export type ErrorCode = keyof typeof STATUS;

/** An expected failure: the caller did something this code refuses, or a dependency is down. */
export class AppError extends Error {
  readonly status: number;
  /** Seconds the caller should wait before trying again (429, 503). */
  readonly retryAfterS?: number;
  /** The issues say it all: the message is a summary for logs, not sent as an issue of its own. */
  readonly issuesOnly: boolean;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues: Issue[] = [],
    opts: { retryAfterS?: number; issuesOnly?: boolean } = {},
  ) {
    super(message);
    this.name = 'AppError';
    this.status = STATUS[code];
    this.retryAfterS = opts.retryAfterS;
    this.issuesOnly = opts.issuesOnly ?? false;
  }
}

/** A refused request answered field by field: the list of issues is the whole answer. */
export function invalidInput(issues: Issue[], code: ErrorCode = 'invalid_input'): AppError {
  const first = issues[0];
  const summary = first ? `${first.path || 'request'}: ${first.message}` : 'invalid input';
  return new AppError(code, summary, issues, { issuesOnly: issues.length > 0 });
}

export function isAppError(err: unknown, code?: ErrorCode): err is AppError {
  return err instanceof AppError && (code === undefined || err.code === code);
}

/**
 * The issues to send: a request refused field by field lists its fields only (the public API's 400 shape);
 * every other failure leads with its message at path "", followed by any fields it names.
 */
export function errorBody(err: AppError): ErrorBody {
  if (err.issuesOnly) return { errors: err.issues };
  return { errors: [{ path: '', message: err.message }, ...err.issues] };
}

/** Flattens zod issues into path/message pairs: every issue, one entry per unknown key, plainer "required" text. */
export function issuesOf(error: zc.$ZodError): Issue[] {
  const out: Issue[] = [];
  const seen = new Set<string>();
  const add = (path: string, message: string) => {
    const key = `${path}\u0000${message}`;
    if (seen.has(key)) return;
    seen.add(key);
    out.push({ path, message });
  };
  for (const issue of error.issues) {
    const base = issue.path.map((p) => String(p)).join('.');
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys)
        add(base ? `${base}.${key}` : key, 'unknown field; check the spelling against the documented request');
    } else if (issue.code === 'invalid_type' && issue.message.endsWith('received undefined')) {
      add(base, `required (${issue.expected})`);
    } else {
      add(base, issue.message);
    }
  }
  return out;
}

/** Parses with a zod schema or throws the refused request with every issue (led by `summary` when given). */
export function parseOrThrow<S extends zc.$ZodType>(schema: S, raw: unknown, summary?: string): zc.output<S> {
  const parsed = z.safeParse(schema, raw);
  if (parsed.success) return parsed.data;
  const issues = issuesOf(parsed.error);
  throw summary ? new AppError('invalid_input', summary, issues) : invalidInput(issues);
}
