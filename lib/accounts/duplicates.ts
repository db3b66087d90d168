import 'server-only';
import { sql } from 'drizzle-orm';
import type { Tx } from '@/db';
import { accounts } from '@/db/schema';
import { comparableName } from './label';

export type SameNamed = { id: string; name: string; site: string | null };

/** Accounts whose company name matches, ignoring case and spacing (the accounts_name index serves it). */
export async function accountsNamed(tx: Tx, name: string): Promise<SameNamed[]> {
  return tx
    .select({ id: accounts.id, name: accounts.name, site: accounts.site })
    .from(accounts)
    .where(sql`lower(regexp_replace(trim(${accounts.name}), '\\s+', ' ', 'g')) = ${comparableName(name)}`)
    .limit(5);
}
