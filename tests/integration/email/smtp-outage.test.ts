import { eq, inArray } from 'drizzle-orm';
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
      expect(row).toMatchObject({ status: 'pending', attempts: 1, sentAt: null });
      expect(row.lastError).toMatch(/ECONNREFUSED|ECONNECTION|ESOCKET/);
      // First retry is 15 s out at the earliest [cp: the mail queue's schedule]; a pass right now takes nothing.
      const job = await rig.job(row.id);
      expect(job.state).toBe('retry');
      expect(job.startAfter.getTime()).toBeGreaterThan(row.createdAt.getTime() + 10_000);
    }
    expect((await rig.drain()).claimed).toBe(0);

    await rig.fake.startSmtp();
    await rig.makeDue(waiting.map((r) => r.id));
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
    const delaysS: number[] = [];
    for (let attempt = 1; attempt <= rig.MAX_ATTEMPTS; attempt += 1) {
      const r = await rig.drain();
      expect(r.claimed).toBe(1);
      const [after] = await rig.db.select().from(outbox).where(eq(outbox.id, row.id));
      if (!after) throw new Error('row vanished');
      expect(after.attempts).toBe(attempt);
      const job = await rig.job(row.id);
      if (attempt < rig.MAX_ATTEMPTS) {
        expect(after.status).toBe('pending');
        delaysS.push((job.startAfter.getTime() - job.startedOn.getTime()) / 1000);
        // Before the retry falls due nothing is claimed; once it is due, it is.
        expect((await rig.drain()).claimed).toBe(0);
        await rig.makeDue([row.id]);
      } else {
        expect(after.status).toBe('dead');
        expect(after.lastError).toMatch(/ECONNREFUSED|ECONNECTION|ESOCKET/);
        expect(job.state).toBe('failed');
      }
    }
    // 15 s doubling, each stretched by up to as much again at random [cp: pg-boss's back-off with jitter].
    expect(delaysS).toHaveLength(rig.MAX_ATTEMPTS - 1);
    delaysS.forEach((delay, n) => {
      expect(delay).toBeGreaterThanOrEqual(15 * 2 ** n - 1);
      expect(delay).toBeLessThanOrEqual(30 * 2 ** n + 1);
    });
    await rig.makeDue([row.id]);
    expect((await rig.drain()).claimed).toBe(0);
    await rig.fake.startSmtp();
    expect(rig.received().filter((m) => m.envelope.to.includes(to ?? ''))).toHaveLength(0);
  });
});
