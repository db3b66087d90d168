import type { StoredMessage } from './message-store';

// The demo's mail page in one answer: the newest messages with their text bodies, so the app makes one
// loopback call per page view instead of one per message. Product code reads it through lib/email/demo-inbox.

/** Messages shown when the caller does not ask for a number. */
export const DEFAULT_INBOX_LIMIT = 50;
const MAX_INBOX_LIMIT = 500;

export type InboxViewMessage = {
  id: string;
  receivedAt: string;
  to: string[];
  subject: string;
  messageId: string | null;
  text: string | null;
  /** Path of the sandboxed HTML body on this API, relative to its base URL. */
  htmlPath: string;
};

export type InboxView = { total: number; messages: InboxViewMessage[] };

/** Reads `?limit=` as a count from 1 to 500; anything else falls back to the default. */
export function inboxLimit(raw: string | null): number {
  const n = Number(raw);
  return Number.isInteger(n) && n >= 1 ? Math.min(n, MAX_INBOX_LIMIT) : DEFAULT_INBOX_LIMIT;
}

/** The newest `limit` messages of the store (kept in arrival order), newest first. */
export function inboxView(messages: readonly StoredMessage[], limit: number): InboxView {
  const newest = messages.slice(-limit).reverse();
  return {
    total: messages.length,
    messages: newest.map((m) => ({
      id: m.id,
      receivedAt: m.receivedAt,
      to: m.to,
      subject: m.subject,
      messageId: m.messageId,
      text: m.text,
      htmlPath: `/messages/${encodeURIComponent(m.id)}/html`,
    })),
  };
}
