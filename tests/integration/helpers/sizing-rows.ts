import { randomUUID } from 'node:crypto';
import { db } from '@/db';
import { sizings, type NewSizing } from '@/db/schema';

/** A stored sizing row for access tests that do not care about the engineering figures. */
export async function makeSizingRow(
  accountId: string,
  userId: string,
  tag = `T-${randomUUID().slice(0, 6)}`,
  over: Partial<NewSizing> = {},
): Promise<string> {
  const [row] = await db
    .insert(sizings)
    .values({
      number: `X-${randomUUID().slice(0, 12)}`,
      accountId,
      title: `Fixture sizing ${tag}`,
      equipmentTag: tag,
      service: 'heater',
      gasKey: 'air',
      gasLabel: 'Air (dry)',
      input: { fixture: true },
      result: { fixture: true },
      engineVersion: 'fixture',
      headlineKw: 10,
      massFlowKgPerS: 0.5,
      createdByUserId: userId,
      ...over,
    })
    .returning({ id: sizings.id });
  return row!.id;
}
