import 'server-only';
import { z } from 'zod';
import { env } from '@/lib/env';

// The demo's mail page reads what the local SMTP server received through its inbox API (GET /inbox),
// never through its code. Production leaves MAIL_FAKE_INBOX_URL unset: mail goes to real mailboxes
// and the page says there is nothing to show.
const TIMEOUT_MS = 2_000;
const SHOWN = 50;

const inboxSchema = z.object({
  total: z.number().int().min(0),
  messages: z.array(
    z.object({
      id: z.string(),
      receivedAt: z.string(),
      to: z.array(z.string()),
      subject: z.string(),
      messageId: z.string().nullable(),
      text: z.string().nullable(),
      htmlPath: z.string().startsWith('/'),
    }),
  ),
});

export type DemoInboxMessage = {
  id: string;
  receivedAt: string;
  to: string[];
  subject: string;
  messageId: string | null;
  text: string | null;
  htmlUrl: string;
};

export type DemoInbox =
  | { state: 'unconfigured' }
  | { state: 'unreachable'; url: string; reason: string }
  | { state: 'ok'; url: string; total: number; messages: DemoInboxMessage[] };

/** The newest messages the demo's mail server has received, newest first, with their text bodies. Never throws. */
export async function readDemoInbox(baseUrl: string | undefined = env.MAIL_FAKE_INBOX_URL): Promise<DemoInbox> {
  if (!baseUrl) return { state: 'unconfigured' };
  const base = baseUrl.replace(/\/$/, '');
  try {
    const res = await fetch(`${base}/inbox?limit=${SHOWN}`, {
      cache: 'no-store',
      signal: AbortSignal.timeout(TIMEOUT_MS),
    });
    if (!res.ok) throw new Error(`${base}/inbox answered ${res.status}`);
    const inbox = inboxSchema.parse(await res.json());
    const messages = inbox.messages.map(({ htmlPath, ...m }) => ({ ...m, htmlUrl: `${base}${htmlPath}` }));
    return { state: 'ok', url: base, total: inbox.total, messages };
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
