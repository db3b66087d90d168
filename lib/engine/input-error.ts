import type { z } from 'zod';

/** One refused field: dotted path into the request ("" for the whole body) and why, with the allowed range. */
export type SizingIssue = { path: string; message: string };

/** Thrown by `calculate` for any input it refuses; `issues` lists every bad field found. */
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

function joinPath(path: readonly PropertyKey[]): string {
  return path.map((p) => String(p)).join('.');
}

/** Flattens zod issues into path/message pairs: one entry per unknown key, friendlier "required" text. */
export function issuesFromZod(error: z.ZodError): SizingIssue[] {
  const out: SizingIssue[] = [];
  const seen = new Set<string>();
  const add = (path: string, message: string) => {
    const key = `${path}\u0000${message}`;
    if (seen.has(key)) return;
    seen.add(key);
    out.push({ path, message });
  };
  for (const issue of error.issues) {
    const base = joinPath(issue.path);
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
