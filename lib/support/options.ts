import 'server-only';
import { asc, inArray } from 'drizzle-orm';
import { db } from '@/db';
import { users } from '@/db/schema';

/** People who create sizings, for the creator filter. */
export async function listStaffOptions(): Promise<{ id: string; name: string }[]> {
  return db
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(inArray(users.role, ['sales_engineer', 'admin', 'customer']))
    .orderBy(asc(users.name))
    .limit(500);
}
