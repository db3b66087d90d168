import { inArray, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outbox } from '@/db/schema';
import { datasheetProps, drainAll, startMailRig, type MailRig } from './mail-rig';

let rig: MailRig;
beforeAll(async () => {
  rig = await startMailRig();
});
afterAll(async () => {
  await rig.close();
});

describe('two app instances draining one outbox', () => {
  it('delivers each of 50 queued messages exactly once', async () => {
    const addresses = Array.from({ length: 50 }, (_, i) => rig.address(`pair${i}`));
    await rig.db.transaction(async (tx) => {
      for (const [i, to] of addresses.entries())
        await rig.enqueueEmail(tx, { template: 'datasheet-issued', to, props: datasheetProps(`DS-PAIR-${i}`) });
    });
    // Two instances, each running several drain loops at once with small batches, so claims collide often.
    const loops = ['instance-a', 'instance-b'].flatMap(() =>
      Array.from({ length: 4 }, () => drainAll(rig, { limit: 2 })),
    );
    const sentPerLoop = await Promise.all(loops);
    expect(sentPerLoop.reduce((sum, n) => sum + n, 0)).toBe(50);

    const rows = await rig.db.select().from(outbox).where(inArray(outbox.toAddress, addresses));
    expect(rows).toHaveLength(50);
    expect(rows.every((r) => r.status === 'sent' && r.attempts === 1)).toBe(true);

    const perMessageId = new Map<string, number>();
    for (const m of rig.received()) perMessageId.set(m.messageId ?? '', (perMessageId.get(m.messageId ?? '') ?? 0) + 1);
    expect(perMessageId.size).toBe(50);
    expect([...perMessageId.values()].every((n) => n === 1)).toBe(true);
    expect([...perMessageId.keys()].sort()).toEqual(rows.map((r) => `<${r.id}@dutywise>`).sort());
  });

  it('skips jobs another instance is claiming at this moment instead of waiting for them', async () => {
    const addresses = Array.from({ length: 4 }, (_, i) => rig.address(`held${i}`));
    await rig.db.transaction(async (tx) => {
      for (const [i, to] of addresses.entries())
        await rig.enqueueEmail(tx, { template: 'datasheet-issued', to, props: datasheetProps(`DS-HELD-${i}`) });
    });
    const held = addresses.slice(0, 2);
    let release: () => void = () => undefined;
    const released = new Promise<void>((resolve) => (release = resolve));
    let locked: () => void = () => undefined;
    const isLocked = new Promise<void>((resolve) => (locked = resolve));
    // The other instance's claim, caught mid-transaction with its locks on the held mails' jobs.
    const other = rig.db.transaction(async (tx) => {
      await tx.execute(sql`set local lock_timeout = '5s'`);
      await tx.execute(
        sql`select id from ${rig.jobTable} where name = 'mail'
          and id in (select id from outbox where to_address in ${held}) for update`,
      );
      locked();
      await released;
    });
    await isLocked;
    try {
      const r = await rig.drain();
      expect(r).toMatchObject({ claimed: 2, sent: 2 });
    } finally {
      release();
      await other;
    }
    const got = rig
      .received()
      .filter((m) => m.envelope.to.some((a) => addresses.includes(a)))
      .flatMap((m) => m.envelope.to);
    expect(got.sort()).toEqual(addresses.slice(2).sort());
    expect(await drainAll(rig)).toBe(2);
  });
});
