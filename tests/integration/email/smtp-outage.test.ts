import { eq, inArray, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outbox } from '@/db/schema';
import { datasheetProps, drainAll, startMailRig, type MailRig } from './mail-rig';

let rig: MailRig;
beforeAll(async () => {
  rig = await startMailRig();
});
afterAll(async () => {
  await rig.fake.startSmtp();
  await rig.close();
});

async function queueMany(prefix: string, count: number): Promise<string[]> {
  const addresses = Array.from({ length: count }, (_, i) => rig.address(`${prefix}${i}`));
  await rig.db.transaction(async (tx) => {
    for (const [i, to] of addresses.entries())
      await rig.enqueueEmail(tx, { template: 'datasheet-issued', to, props: datasheetProps(`DS-${prefix}-${i}`) });
  });
  return addresses;
}

describe('SMTP server down', () => {
  it('keeps mail pending with the error while SMTP is down and delivers each exactly once after it returns', async () => {
    const addresses = await queueMany('out', 6);
    await rig.fake.stopSmtp();
    const down = await rig.drain();
    expect(down).toMatchObject({ claimed: 6, sent: 0, retried: 6, dead: 0 });
    const waiting = await rig.db.select().from(outbox).where(inArray(outbox.toAddress, addresses));
    expect(waiting).toHaveLength(6);
    for (const row of waiting) {
      expect(row).toMatchObject({ status: 'pending', attempts: 1, lockedUntil: null, sentAt: null });
      expect(row.lastError).toMatch(/ECONNREFUSED|ECONNECTION|ESOCKET/);
      // First retry is 15 s out [cp: backoff schedule of this outbox]; a pass right now takes nothing.
      expect(row.nextAttemptAt.getTime()).toBeGreaterThan(row.createdAt.getTime() + 10_000);
    }
    expect((await rig.drain()).claimed).toBe(0);

    await rig.fake.startSmtp();
    // Time passing, without waiting for it: the retries fall due.
    await rig.db.execute(
      sql`update outbox set next_attempt_at = now() - interval '1 second' where to_address in ${addresses}`,
    );
    expect(await drainAll(rig)).toBe(6);
    const sent = await rig.db.select().from(outbox).where(inArray(outbox.toAddress, addresses));
    expect(sent.every((r) => r.status === 'sent' && r.attempts === 2)).toBe(true);
    const got = rig.received().filter((m) => m.envelope.to.some((a) => addresses.includes(a)));
    expect(got.map((m) => m.messageId).sort()).toEqual(sent.map((r) => `<${r.id}@dutywise>`).sort());
  });

  it('backs off exponentially and marks the mail dead after the last allowed attempt', async () => {
    const [to] = await queueMany('dead', 1);
    await rig.fake.stopSmtp();
    const [row] = await rig.db
      .select()
      .from(outbox)
      .where(eq(outbox.toAddress, to ?? ''));
    if (!row) throw new Error('not queued');
    let clock = new Date(row.nextAttemptAt.getTime() + 1_000);
    const delaysS: number[] = [];
    for (let attempt = 1; attempt <= rig.MAX_ATTEMPTS; attempt += 1) {
      const r = await rig.drain({ now: clock });
      expect(r.claimed).toBe(1);
      const [after] = await rig.db.select().from(outbox).where(eq(outbox.id, row.id));
      if (!after) throw new Error('row vanished');
      expect(after.attempts).toBe(attempt);
      if (attempt < rig.MAX_ATTEMPTS) {
        expect(after.status).toBe('pending');
        delaysS.push(Math.round((after.nextAttemptAt.getTime() - clock.getTime()) / 1000));
        // Just before the retry falls due nothing is claimed; just after, it is.
        expect((await rig.drain({ now: new Date(after.nextAttemptAt.getTime() - 1_000) })).claimed).toBe(0);
        clock = new Date(after.nextAttemptAt.getTime() + 1_000);
      } else {
        expect(after.status).toBe('dead');
        expect(after.lastError).toMatch(/ECONNREFUSED|ECONNECTION|ESOCKET/);
      }
    }
    // 15 s doubling, capped at 30 min [cp: this outbox's schedule].
    expect(delaysS).toEqual([15, 30, 60, 120, 240, 480, 960, 1800, 1800, 1800, 1800]);
    expect((await rig.drain({ now: new Date(clock.getTime() + 86_400_000) })).claimed).toBe(0);
    await rig.fake.startSmtp();
    expect(rig.received().filter((m) => m.envelope.to.includes(to ?? ''))).toHaveLength(0);
  });
});
