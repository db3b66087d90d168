// Seeds the invented demo scenario once. `--reset` empties every table first (test databases only).
// The scenario's sign-ins share one published password, so the seed refuses any database whose name does not
// end in _demo, _test or _bench unless `--force` is given.
import { and, eq, inArray, sql } from 'drizzle-orm';
import { db, pool } from '@/db';
import { accounts, memberships, quotes, sizings, users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';
import { DEMO_PASSWORD } from '@/lib/auth/demo-users';
import { createQuote, setQuoteStatus } from '@/lib/quotes/mutations';
import { computeForSave, insertSizing, saveSizing } from '@/lib/sizings/save';
import { hashPassword } from '@/lib/auth/local/passwords';
import { issueDatasheet } from '@/lib/datasheets/issue';
import { seedAccounts, seedDatasheets, seedQuotes, seedSizings, seedUsers } from './seed-scenario';
import { billingAccounts, billingDatasheets, billingSizings, billingUsers } from './seed-scenario-billing';

// The accounts with demo subscriptions come after the rest, so the first accounts, sizings and datasheets keep their
// numbers; db/seed-billing.ts gives them their subscriptions once the Stripe fake is up.
const allAccounts = [...seedAccounts, ...billingAccounts];
const allUsers = [...seedUsers, ...billingUsers];
const allSizings = [...seedSizings, ...billingSizings];
const allDatasheets = [...seedDatasheets, ...billingDatasheets];

const reset = process.argv.includes('--reset');
const force = process.argv.includes('--force');
const dbName = new URL(process.env.DATABASE_URL ?? 'postgres://x@h/dutywise_demo').pathname.slice(1);

async function main() {
  if (!/_(demo|test|bench)$/.test(dbName) && !force)
    throw new Error(
      `the demo seed refuses '${dbName}': its users share a published password. Seed only a database named *_demo, *_test or *_bench, or pass --force.`,
    );
  if (reset) {
    if (!dbName.endsWith('_test')) throw new Error(`--reset refuses to empty '${dbName}': only databases named *_test`);
    const tables = await db.execute<{ t: string }>(
      sql`select tablename as t from pg_tables where schemaname = 'public'`,
    );
    const list = tables.rows.map((r) => `"${r.t}"`).join(', ');
    if (list) await db.execute(sql.raw(`truncate ${list} restart identity cascade`));
  }
  const [marker] = await db
    .select({ id: users.id })
    .from(users)
    .where(eq(users.email, 'admin@halvard.example'))
    .limit(1);
  if (marker) {
    console.log('demo data already present; nothing to seed');
    return;
  }
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const accountIds = new Map<string, string>();
  const people = new Map<string, CurrentUser>();
  await db.transaction(async (tx) => {
    for (const a of allAccounts) {
      const { key, ...values } = a;
      const [row] = await tx.insert(accounts).values(values).returning({ id: accounts.id });
      accountIds.set(key, row!.id);
    }
    for (const u of allUsers) {
      const [row] = await tx
        .insert(users)
        .values({ email: u.email, name: u.name, role: u.role, passwordHash, emailVerifiedAt: new Date() })
        .returning({ id: users.id });
      const accountId = u.account ? accountIds.get(u.account)! : null;
      if (accountId) await tx.insert(memberships).values({ accountId, userId: row!.id });
      people.set(u.email, {
        id: row!.id,
        email: u.email,
        name: u.name,
        role: u.role,
        accountId,
        unitSystem: u.email.endsWith('oakhollow.example') ? 'us' : 'si',
      });
    }
    await tx.update(users).set({ unitSystem: 'us' }).where(eq(users.email, 'dev.hartigan@oakhollow.example'));
    for (const s of allSizings) {
      const accountId = accountIds.get(s.account)!;
      await insertSizing(
        tx,
        people.get(s.by)!,
        { accountId, quoteId: undefined, title: s.title, equipmentTag: s.tag, notes: s.notes },
        computeForSave(s.input),
      );
    }
  });
  for (const qd of seedQuotes) {
    const accountId = accountIds.get(qd.account)!;
    const user = people.get(qd.by)!;
    const tagged = await db
      .select({ id: sizings.id, tag: sizings.equipmentTag })
      .from(sizings)
      .where(eq(sizings.accountId, accountId));
    const ids = qd.lines.map((l) => tagged.find((t) => t.tag === l.tag)!.id);
    const { id } = await createQuote(user, { accountId, title: qd.title, notes: qd.notes, sizingIds: ids });
    for (const l of qd.lines.filter((x) => x.quantity !== 1 || x.unitPrice)) {
      const sid = tagged.find((t) => t.tag === l.tag)!.id;
      await db.execute(
        sql`update quote_items set quantity = ${l.quantity}, unit_price = ${l.unitPrice ?? null} where quote_id = ${id} and sizing_id = ${sid}`,
      );
    }
    if (qd.status !== 'draft') await setQuoteStatus(user, id, qd.status);
    if (qd.status !== 'draft') await db.update(quotes).set({ sentAt: new Date() }).where(eq(quotes.id, id));
  }
  for (const d of allDatasheets) {
    // The scenario's own sizing with that tag: a benchmark database also holds generated sizings with the same tags.
    const [row] = await db
      .select()
      .from(sizings)
      .where(and(eq(sizings.equipmentTag, d.tag), inArray(sizings.accountId, [...accountIds.values()])))
      .limit(1);
    const by = people.get(d.by)!;
    for (const [i, note] of d.notes.entries()) {
      if (d.revise?.before === i) {
        const meta = { accountId: row!.accountId, title: row!.title, equipmentTag: d.tag, notes: d.revise.notes };
        const input = { ...(row!.input as Record<string, unknown>), ...d.revise.change };
        await saveSizing(by, { ...meta, quoteId: undefined, revisedFromId: row!.id }, input);
      }
      await issueDatasheet(by, { sizingId: row!.id, note });
    }
  }
  console.log(
    `seeded ${allAccounts.length} accounts, ${allUsers.length} users, ${allSizings.length} sizings, ${seedQuotes.length} quotes, ${allDatasheets.length} datasheets`,
  );
}

main()
  .catch((err) => {
    console.error(err);
    process.exitCode = 1;
  })
  .finally(() => pool.end());
