import 'server-only';
import type { CurrentUser } from '@/lib/auth/current-user';
import { can } from '@/lib/auth/roles';
import { getBlobStore, type BlobStore } from '@/lib/blob';
import { AppError, parseOrThrow } from '@/lib/errors';
import { enforce } from '@/lib/ratelimit/limit';
import { getSizing } from '@/lib/sizings/queries';
import { commitIssue, type BeforeCommit, type IssuedRevision } from './issue-commit';
import { engineResultOf, loadIssueAccount, planIssue } from './issue-plan';
import { renderDatasheetPdf } from './render';
import { issueDatasheetSchema } from './schema';

export type { IssuedRevision } from './issue-commit';

export type IssueOptions = { store?: BlobStore; beforeCommit?: BeforeCommit };

const ATTEMPTS = 3;

/**
 * Issues the next revision of a sizing's datasheet ('A' on first issue, with a new number): renders the
 * PDF outside the transaction, then stores bytes, revision row, audit entry and the customer's e-mail
 * in one transaction. Concurrent issues of one sizing are serialised and each gets its own letter.
 */
export async function issueDatasheet(
  user: CurrentUser,
  input: { sizingId: string; note?: string },
  opts: IssueOptions = {},
): Promise<IssuedRevision> {
  if (!can(user.role, 'datasheet:issue'))
    throw new AppError('forbidden', 'Your role does not allow issuing datasheets.');
  const request = parseOrThrow(issueDatasheetSchema, input, 'The datasheet request is not valid.');
  const sizing = await getSizing(user, request.sizingId);
  engineResultOf(sizing);
  await enforce('datasheet issues', ['datasheet.user', user.id], ['datasheet.account', sizing.accountId]);
  const account = await loadIssueAccount(sizing.accountId);
  const store = opts.store ?? getBlobStore();
  for (let attempt = 0; attempt < ATTEMPTS; attempt++) {
    const plan = await planIssue(user, sizing, account, request.note ?? null);
    const bytes = await renderDatasheetPdf(plan.snapshot);
    const issued = await commitIssue(plan, bytes, store, opts.beforeCommit);
    if (issued) return issued;
  }
  throw new AppError(
    'conflict',
    'Other revisions of this datasheet were being issued at the same moment; reload the page and try again.',
  );
}
