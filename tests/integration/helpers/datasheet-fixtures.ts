import { randomUUID } from 'node:crypto';
import { eq } from 'drizzle-orm';
import { db } from '@/db';
import { accounts, subscriptions } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { calculate } from '@/lib/engine';
import { insertSizing } from '@/lib/sizings/save';

/** A sizing stored exactly as the app stores one: the engine's real answer beside the request. */
export async function makeEngineSizing(
  user: CurrentUser,
  accountId: string,
  request: Record<string, unknown>,
  meta: { title: string; tag: string },
) {
  const result = calculate(request);
  const row = await db.transaction((tx) =>
    insertSizing(
      tx,
      user,
      {
        accountId,
        title: meta.title,
        equipmentTag: meta.tag,
        notes: undefined,
        quoteId: undefined,
        revisedFromId: undefined,
      },
      { input: request, result },
    ),
  );
  return { id: row.id, number: row.number, result };
}

/** Gives the account an active subscription until `days` from now, as the billing webhooks would record it. */
export async function grantSubscription(accountId: string, days = 30): Promise<void> {
  await db.insert(subscriptions).values({
    accountId,
    stripeSubscriptionId: `sub_test_${randomUUID().slice(0, 12)}`,
    status: 'active',
    currentPeriodEnd: new Date(Date.now() + days * 86_400_000),
  });
}

export async function setAccountSite(accountId: string, site: string): Promise<void> {
  await db.update(accounts).set({ site }).where(eq(accounts.id, accountId));
}
