// The demo's subscriptions, run on every demo start after db/seed.ts and once the local Stripe fake is up
// (`npm run db:seed-billing`): every stored subscription follows the fake, and the scenario's subscription accounts get
// their states where they have none (see db/demo-billing.ts). Refuses the same databases as the seed, and any payment
// service but the local fake.
import { inArray } from 'drizzle-orm';
import { db, pool } from '@/db';
import { accounts } from '@/db/schema';
import { type DemoBillingSpec, seedDemoBilling } from './demo-billing';
import { localFakeUrl } from './demo-billing-fake';
import { billingAccounts, billingStates } from './seed-scenario-billing';

const dbName = new URL(process.env.DATABASE_URL ?? 'postgres://x@h/dutywise_demo').pathname.slice(1);

async function main() {
  if (!/_(demo|test|bench)$/.test(dbName))
    throw new Error(
      `demo subscriptions are seeded only into a database named *_demo, *_test or *_bench, not '${dbName}'`,
    );
  const fake = localFakeUrl();
  const names = billingAccounts.map((a) => a.name);
  const rows = await db
    .select({ id: accounts.id, name: accounts.name })
    .from(accounts)
    .where(inArray(accounts.name, names));
  const specs: DemoBillingSpec[] = billingAccounts.map((a) => {
    const row = rows.find((r) => r.name === a.name);
    if (!row) throw new Error(`no account named ${a.name}: run db/seed.ts first`);
    return { accountId: row.id, state: billingStates[a.key] };
  });
  const r = await seedDemoBilling(specs, { scope: 'all', resetFakeWhenUnlinked: true });
  console.log(
    `demo subscriptions (${fake}): ${r.synced} in agreement, ${r.opened} opened, ${r.refailed} renewals failed again, ` +
      `${r.dropped + r.unlinked} links the fake no longer holds removed`,
  );
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
