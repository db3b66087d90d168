import { expect } from '@playwright/test';
import { e2ePorts } from '../ports';

type Listed = { id: string; subject: string };

/** Waits for a mail to `address` whose subject matches, then returns the first link in it that matches `link`. */
export async function linkFromInbox(address: string, subject: RegExp, link: RegExp): Promise<string> {
  const base = `http://127.0.0.1:${e2ePorts.smtpHttp}`;
  let found: Listed | undefined;
  await expect
    .poll(
      async () => {
        const res = await fetch(`${base}/messages?to=${encodeURIComponent(address)}`);
        const body = (await res.json()) as Listed[] | { data?: Listed[] };
        const list = Array.isArray(body) ? body : (body.data ?? []);
        found = list.filter((m) => subject.test(m.subject)).at(-1);
        return Boolean(found);
      },
      { timeout: 30_000, message: `a mail to ${address} with subject ${subject}` },
    )
    .toBe(true);
  const message = (await (await fetch(`${base}/messages/${found!.id}`)).json()) as { text: string | null };
  const url = (message.text ?? '').match(link)?.[0];
  if (!url) throw new Error(`no link matching ${link} in the mail to ${address}`);
  return url;
}
