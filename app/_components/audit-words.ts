import { roleLabels, type UserRole } from '@/lib/auth/roles';
import { providerStatusWords } from '@/lib/billing/labels';
import { quoteStatusLabels } from './status-badge';

// The audit trail in words: what happened and what changed, not action codes, ids and raw JSON.

const ACTIONS: Readonly<Record<string, string>> = {
  'account.created': 'Created the customer account',
  'account.signed_up': 'Signed up with a new customer account',
  'account.updated': 'Changed the account details',
  'batch.saved': 'Saved a batch upload',
  'billing.customer_created': 'Set up billing',
  'billing.subscription_status': 'Subscription changed',
  'billing.customer_unlinked': 'Removed a billing link the payment service no longer holds',
  'billing.subscription_dropped': 'Removed a subscription the payment service no longer holds',
  'datasheet.downloaded': 'Downloaded a datasheet',
  'datasheet.email_resent': 'Sent the datasheet e-mail again',
  'datasheet.issued': 'Issued a datasheet',
  'member.invited': 'Invited a customer user',
  'member.joined': 'Joined the customer account',
  'quote.created': 'Created a quote',
  'quote.line_added': 'Added a quote line',
  'quote.line_removed': 'Removed a quote line',
  'quote.lines_added': 'Added quote lines',
  'quote.document_bound': 'Bound the quote PDF',
  'quote.document_downloaded': 'Downloaded the quote PDF',
  'quote.sent': 'Sent the quote',
  'quote.status_changed': 'Changed the quote status',
  'user.created': 'Created a sign-in',
  'user.role_changed': 'Changed a role',
  'user.disabled': 'Disabled a sign-in',
  'user.enabled': 'Enabled a sign-in',
  'user.invited': 'Invited a staff member',
  'user.joined': 'Joined as staff',
  'support.searched': 'Looked up sizings',
};

/** "Changed a role"; an unknown action reads as its words ("quote.archived" → "Quote archived"). */
export function actionWords(action: string): string {
  const known = ACTIONS[action];
  if (known) return known;
  const text = action.replace(/[._]/g, ' ');
  return text.charAt(0).toUpperCase() + text.slice(1);
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
const HIDDEN = new Set(['sha256', 'toLabel', 'quoteId', 'itemId', 'subscription', 'customer', 'sizingId']);

function valueWords(key: string, value: unknown): string | null {
  if (value === null || value === undefined || value === '') return null;
  if (typeof value === 'string') {
    if (UUID.test(value)) return null;
    if (key === 'from' || key === 'to' || key === 'role') {
      if (value in roleLabels) return roleLabels[value as UserRole];
      if (value in quoteStatusLabels) return quoteStatusLabels[value]!;
    }
    return value;
  }
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  if (Array.isArray(value)) {
    const parts = value.map((v) => valueWords(key, v)).filter((v): v is string => v !== null);
    return parts.length
      ? parts.length > 8
        ? `${parts.slice(0, 8).join(', ')} and ${parts.length - 8} more`
        : parts.join(', ')
      : null;
  }
  return null;
}

const keyWords = (key: string) => key.replace(/([a-z])([A-Z])/g, '$1 $2').toLowerCase();

/** What changed, in words: "Sales engineer → Support · e-mail: a@b.example". */
export function detailWords(action: string, detail: unknown): string {
  if (!detail || typeof detail !== 'object') return '';
  const d = detail as Record<string, unknown>;
  const parts: string[] = [];
  if ('from' in d || 'to' in d) {
    const status = action === 'billing.subscription_status';
    const word = (v: unknown) =>
      status && typeof v === 'string' ? (providerStatusWords[v] ?? v) : (valueWords('to', v) ?? 'none');
    if (action !== 'datasheet.email_resent') parts.push(`${word(d.from)} → ${word(d.to)}`);
  }
  for (const [key, value] of Object.entries(d)) {
    if (HIDDEN.has(key) || ((key === 'from' || key === 'to') && action !== 'datasheet.email_resent')) continue;
    const words = valueWords(key, value);
    if (words !== null) parts.push(`${keyWords(key)}: ${words}`);
  }
  return parts.join(' · ');
}
