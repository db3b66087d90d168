import { expect } from '@playwright/test';
import { e2ePorts } from '../ports';

type Listed = { id: string; subject: string };

/**
 * Waits until `atLeast` mails to `address` have a matching subject, then returns the first link matching `link` in
 * the newest. Wait for every mail the journey caused: a newer one-time link makes the older ones invalid.
 */
export async function linkFromInbox(address: string, subject: RegExp, link: RegExp, atLeast = 1): Promise<string> {
  const base = `http://127.0.0.1:${e2ePorts.smtpHttp}`;
  let found: Listed | undefined;
  await expect
    .poll(
      async () => {
        const res = await fetch(`${base}/messages?to=${encodeURIComponent(address)}`);
        const body = (await res.json()) as Listed[] | { data?: Listed[] };
        const list = Array.isArray(body) ? body : (body.data ?? []);
        const matching = list.filter((m) => subject.test(m.subject));
        found = matching.at(-1);
        return matching.length >= atLeast;
      },
      { timeout: 30_000, message: `a mail to ${address} with subject ${subject}` },
    )
    .toBe(true);
  const message = (await (await fetch(`${base}/messages/${found!.id}`)).json()) as { text: string | null };
  const url = (message.text ?? '').match(link)?.[0];
  if (!url) throw new Error(`no link matching ${link} in the mail to ${address}`);
  return url;
}
