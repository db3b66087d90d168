import 'server-only';
import { eq } from 'drizzle-orm';
import { z } from 'zod';
import { db } from '@/db';
import { users } from '@/db/schema';
import type { CurrentUser } from '@/lib/auth/current-user';

export const unitSystemSchema = z.object({
  unitSystem: z.enum(['si', 'us'], { error: 'Unit system must be "si" or "us".' }),
});
export type UnitSystemInput = z.output<typeof unitSystemSchema>;

/** Stores the signed-in user's unit system; the desk opens in it next time. */
export async function setUnitSystem(user: CurrentUser, input: UnitSystemInput): Promise<UnitSystemInput> {
  await db.update(users).set({ unitSystem: input.unitSystem, updatedAt: new Date() }).where(eq(users.id, user.id));
  return { unitSystem: input.unitSystem };
}
