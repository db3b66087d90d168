import 'server-only';
import { z } from 'zod';
import { env } from '@/lib/env';

// Reads the local SMTP fake's inbox API (mocks/smtp) for the demo's mail page. Not used in production,
// where MAIL_FAKE_INBOX_URL is unset and mail goes to real mailboxes.
const TIMEOUT_MS = 2_000;
const SHOWN = 50;

const summarySchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  messageId: z.string().nullable(),
});
const listSchema = z.object({ data: z.array(summarySchema) });
const detailSchema = summarySchema.extend({ text: z.string().nullable() });

export type FakeInboxMessage = {
  id: string;
  receivedAt: string;
  to: string[];
  subject: string;
  messageId: string | null;
  text: string | null;
  htmlUrl: string;
};

export type FakeInbox =
  | { state: 'unconfigured' }
  | { state: 'unreachable'; url: string; reason: string }
  | { state: 'ok'; url: string; total: number; messages: FakeInboxMessage[] };

async function getJson(url: string): Promise<unknown> {
  const res = await fetch(url, { cache: 'no-store', signal: AbortSignal.timeout(TIMEOUT_MS) });
  if (!res.ok) throw new Error(`${url} answered ${res.status}`);
  return res.json();
}

/** The newest messages the local SMTP fake has received, with their text bodies. Never throws. */
export async function readFakeInbox(baseUrl: string | undefined = env.MAIL_FAKE_INBOX_URL): Promise<FakeInbox> {
  if (!baseUrl) return { state: 'unconfigured' };
  const base = baseUrl.replace(/\/$/, '');
  try {
    const list = listSchema.parse(await getJson(`${base}/messages`));
    const newest = list.data.slice(-SHOWN).reverse();
    // The list leaves bodies out; fetch each shown message's text (loopback, at most SHOWN calls).
    const messages = await Promise.all(
      newest.map(async (m) => {
        const detail = detailSchema.safeParse(
          await getJson(`${base}/messages/${encodeURIComponent(m.id)}`).catch(() => null),
        );
        return {
          ...m,
          text: detail.success ? detail.data.text : null,
          htmlUrl: `${base}/messages/${encodeURIComponent(m.id)}/html`,
        };
      }),
    );
    return { state: 'ok', url: base, total: list.data.length, messages };
  } catch (error) {
    const reason =
      error instanceof z.ZodError
        ? 'it answered with something other than the inbox API'
        : error instanceof Error
          ? error.message
          : String(error);
    return { state: 'unreachable', url: base, reason };
  }
}
