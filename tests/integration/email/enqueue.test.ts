import { randomUUID } from 'node:crypto';
import { eq, sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { outbox } from '@/db/schema';
import { datasheetProps, startMailRig, type MailRig } from './mail-rig';

let rig: MailRig;
beforeAll(async () => {
  rig = await startMailRig();
});
afterAll(async () => {
  await rig.close();
});

const rowsTo = (to: string) => rig.db.select().from(outbox).where(eq(outbox.toAddress, to));

describe('queueing mail with the change that causes it', () => {
  it('leaves no outbox row when the transaction rolls back', async () => {
    const to = rig.address('rollback');
    const jobsBefore = await rig.jobCount();
    await expect(
      rig.db.transaction(async (tx) => {
        await rig.enqueueEmail(tx, { template: 'datasheet-issued', to, props: datasheetProps('DS-RB-1') });
        throw new Error('issue failed after queueing');
      }),
    ).rejects.toThrow('issue failed after queueing');
    expect(await rowsTo(to)).toHaveLength(0);
    expect(await rig.jobCount()).toBe(jobsBefore);
  });

  it('stores one pending row with subject, payload and entity when the transaction commits', async () => {
    const to = rig.address('commit');
    const entityId = randomUUID();
    await rig.db.transaction((tx) =>
      rig.enqueueEmail(tx, {
        template: 'datasheet-issued',
        to,
        props: datasheetProps('DS-CM-2'),
        entity: { type: 'datasheet', id: entityId },
      }),
    );
    const [row, ...more] = await rowsTo(to);
    expect(more).toHaveLength(0);
    expect(row).toMatchObject({
      status: 'pending',
      attempts: 0,
      subject: 'Datasheet DS-CM-2 rev. A issued',
      entityType: 'datasheet',
      entityId,
      sentAt: null,
    });
    // Its delivery job was queued in the same transaction, under the row's id.
    expect(await rig.job(row!.id)).toMatchObject({ state: 'created', data: { outboxId: row!.id } });
    expect((row?.payload as { datasheetNumber: string }).datasheetNumber).toBe('DS-CM-2');
  });

  it('queues a deduplicated mail once', async () => {
    const to = rig.address('dedupe');
    const dedupeKey = `invoice-failed:${randomUUID()}`;
    const props = { accountName: 'Stennick Gas Storage', billingUrl: '/billing', graceDays: 7 };
    const jobsBefore = await rig.jobCount();
    for (let i = 0; i < 2; i += 1)
      await rig.db.transaction((tx) => rig.enqueueEmail(tx, { template: 'payment-failed', to, props, dedupeKey }));
    expect(await rowsTo(to)).toHaveLength(1);
    expect(await rig.jobCount()).toBe(jobsBefore + 1);
  });

  it('stores a mail that can never be sent as dead, naming the field, and still commits the change', async () => {
    const bad = `not-an-address.${rig.domain}`;
    const to = rig.address('badprops');
    await rig.db.transaction(async (tx) => {
      await rig.enqueueEmail(tx, { template: 'datasheet-issued', to: bad, props: datasheetProps('DS-BAD-1') });
      await rig.enqueueEmail(tx, {
        template: 'datasheet-issued',
        to,
        props: { ...datasheetProps('DS-BAD-2'), revision: ' ' },
      });
    });
    const [badTo] = await rowsTo(bad);
    expect(badTo).toMatchObject({ status: 'dead', attempts: 0 });
    expect(badTo?.lastError).toMatch(/^not sent: to must be a single e-mail address/);
    const [badProps] = await rowsTo(to);
    expect(badProps).toMatchObject({ status: 'dead', attempts: 0 });
    expect(badProps?.lastError).toMatch(/props\.revision must not be empty/);
    // A dead row is never claimed, so nothing goes out.
    await rig.drain();
    expect(await rowsTo(to)).toMatchObject([{ status: 'dead', attempts: 0 }]);
    expect(rig.received().filter((m) => m.envelope.to.includes(to))).toHaveLength(0);
    await rig.db.delete(outbox).where(eq(outbox.toAddress, bad));
  });
});

describe('mail history and backlog', () => {
  it('lists the mail about one entity with status, attempts and error, newest first', async () => {
    const { listEmailsFor } = await import('@/lib/email/queries');
    const entity = { type: 'datasheet', id: randomUUID() };
    const first = rig.address('hist1');
    const second = rig.address('hist2');
    await rig.db.transaction((tx) =>
      rig.enqueueEmail(tx, { template: 'datasheet-issued', to: first, props: datasheetProps('DS-H-1'), entity }),
    );
    await rig.db.execute(
      sql`update outbox set created_at = now() - interval '1 minute', status = 'dead', attempts = 12, last_error = 'ECONNECTION gave up' where to_address = ${first}`,
    );
    await rig.db.transaction((tx) =>
      rig.enqueueEmail(tx, { template: 'datasheet-issued', to: second, props: datasheetProps('DS-H-1'), entity }),
    );
    const list = await listEmailsFor(entity.type, entity.id);
    expect(list.map((e) => e.to)).toEqual([second, first]);
    expect(list[0]).toMatchObject({
      status: 'pending',
      attempts: 0,
      sentAt: null,
      lastError: null,
      subject: 'Datasheet DS-H-1 rev. A issued',
    });
    // Waiting mail shows when its job is due (read from the job queue).
    expect(list[0]?.nextAttemptAt).toBeInstanceOf(Date);
    expect(list[1]).toMatchObject({
      status: 'dead',
      attempts: 12,
      lastError: 'ECONNECTION gave up',
      nextAttemptAt: null,
    });
    expect(Object.keys(list[0] ?? {}).sort()).toEqual([
      'attempts',
      'createdAt',
      'id',
      'lastError',
      'nextAttemptAt',
      'sentAt',
      'status',
      'subject',
      'to',
    ]);
    expect(await listEmailsFor(entity.type, randomUUID())).toEqual([]);
  });

  it('reports pending and dead counts and the age of the oldest waiting mail', async () => {
    const { outboxBacklog } = await import('@/lib/email/queries');
    const before = await outboxBacklog();
    const waiting = rig.address('backlog');
    const given = rig.address('backlog-dead');
    await rig.db.transaction(async (tx) => {
      await rig.enqueueEmail(tx, { template: 'datasheet-issued', to: waiting, props: datasheetProps('DS-B-1') });
      await rig.enqueueEmail(tx, { template: 'datasheet-issued', to: given, props: datasheetProps('DS-B-2') });
    });
    await rig.db.execute(sql`update outbox set created_at = now() - interval '2 hours' where to_address = ${waiting}`);
    await rig.db.execute(sql`update outbox set status = 'dead' where to_address = ${given}`);
    const after = await outboxBacklog();
    expect(after.pending).toBeGreaterThanOrEqual(1);
    expect(after.dead).toBeGreaterThanOrEqual(before.dead + 1);
    expect(after.oldestPendingAgeS).toBeGreaterThanOrEqual(7200);
  });
});
