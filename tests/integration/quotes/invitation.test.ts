import { and, eq } from 'drizzle-orm';
import { describe, expect, it } from 'vitest';
import { db } from '@/db';
import { accounts, invitations, memberships, outbox } from '@/db/schema';
import { acceptInvitation } from '@/lib/accounts/mutations';
import type { EmailProps } from '@/lib/email/catalogue';
import { createQuote, sendQuote } from '@/lib/quotes/mutations';
import { makeAccount, makeUser } from '../helpers/fixtures';
import { makeSizingRow } from '../helpers/sizing-rows';

async function quoteToSend() {
  const acct = await makeAccount('Invited');
  const engineer = await makeUser('sales_engineer');
  const s1 = await makeSizingRow(acct.id, engineer.id);
  const { id } = await createQuote(engineer, { accountId: acct.id, title: 'Quote to a new contact', sizingIds: [s1] });
  return { acct, engineer, id };
}

const mailFor = async (quoteId: string) =>
  (await db.select().from(outbox).where(eq(outbox.entityId, quoteId))).map(
    (m) => m.payload as EmailProps['quote-sent'],
  );

describe('sending a quote to a billing contact with no sign-in', () => {
  it('invites them to the account in the same e-mail, with the quote as where to land; joining makes them a member', async () => {
    const { acct, engineer, id } = await quoteToSend();
    const sent = await sendQuote(engineer, id);
    expect(sent).toEqual({ to: acct.billingContactEmail, invited: true });
    const inv = await db.select().from(invitations).where(eq(invitations.accountId, acct.id));
    expect(inv.map((i) => i.email)).toEqual([acct.billingContactEmail]);
    const [mail] = await mailFor(id);
    expect(mail!.joinUrl).toMatch(new RegExp(`/invite/[\\w-]+\\?next=${encodeURIComponent(`/quotes/${id}`)}$`));

    const token = new URL(mail!.joinUrl!).pathname.split('/invite/')[1]!;
    const joined = await acceptInvitation(token, 'Billing Contact', 'a-long-password');
    const membership = await db
      .select()
      .from(memberships)
      .where(and(eq(memberships.userId, joined.userId), eq(memberships.accountId, acct.id)));
    expect(membership).toHaveLength(1);

    // Sent again, the contact now signs in: a plain link, no second invitation.
    expect(await sendQuote(engineer, id)).toEqual({ to: acct.billingContactEmail, invited: false });
    const mails = await mailFor(id);
    expect(mails.map((m) => m.joinUrl ?? null).filter((u) => u === null)).toHaveLength(1);
    expect(await db.select().from(invitations).where(eq(invitations.accountId, acct.id))).toHaveLength(1);
  });
});

describe('sending a quote to a billing contact who already signs in', () => {
  it('sends the plain quote link and records no invitation', async () => {
    const { acct, engineer, id } = await quoteToSend();
    const contact = await makeUser('customer', acct.id);
    await db.update(accounts).set({ billingContactEmail: contact.email }).where(eq(accounts.id, acct.id));
    expect(await sendQuote(engineer, id)).toEqual({ to: contact.email, invited: false });
    expect((await mailFor(id))[0]?.joinUrl).toBeNull();
    expect(await db.select().from(invitations).where(eq(invitations.accountId, acct.id))).toHaveLength(0);
  });
});
