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

async function queue(to: string, number: string) {
  await rig.db.transaction((tx) =>
    rig.enqueueEmail(tx, { template: 'datasheet-issued', to, props: datasheetProps(number) }),
  );
  const [row] = await rig.db.select().from(outbox).where(eq(outbox.toAddress, to));
  if (!row) throw new Error('not queued');
  return row;
}
const rowById = async (id: string) => (await rig.db.select().from(outbox).where(eq(outbox.id, id)))[0];

describe('delivering queued mail', () => {
  it('sends a queued mail and records it as sent', async () => {
    const to = rig.address('send');
    const row = await queue(to, 'DS-SEND-1');
    const result = await rig.drain();
    expect(result).toMatchObject({ claimed: 1, sent: 1, retried: 0, dead: 0 });
    const got = rig.received().filter((m) => m.envelope.to.includes(to));
    expect(got).toHaveLength(1);
    expect(got[0]).toMatchObject({
      subject: 'Datasheet DS-SEND-1 rev. A issued',
      to: [to],
      from: 'desk@dutywise.test',
      messageId: `<${row.id}@dutywise>`,
    });
    expect(got[0]?.text).toContain('DS-SEND-1');
    expect(got[0]?.html).toContain('DS-SEND-1');
    const after = await rowById(row.id);
    expect(after).toMatchObject({ status: 'sent', attempts: 1, messageId: `<${row.id}@dutywise>` });
    expect(after?.sentAt).toBeInstanceOf(Date);
    expect((await rig.job(row.id)).state).toBe('completed');
    expect((await rig.drain()).claimed).toBe(0);
  });

  it('does not take a job another worker holds, and takes it back once that claim has expired', async () => {
    const to = rig.address('lock');
    const row = await queue(to, 'DS-LOCK-2');
    // As if a worker took the job and died mid-send: attempt counted, its time not yet run out.
    await rig.db.execute(sql`update outbox set attempts = 1 where id = ${row.id}`);
    await rig.db.execute(
      sql`update ${rig.jobTable} set state = 'active', started_on = now() where name = 'mail' and id = ${row.id}`,
    );
    expect((await rig.drain()).claimed).toBe(0);
    expect(rig.received().filter((m) => m.envelope.to.includes(to))).toHaveLength(0);
    await rig.expire([row.id]);
    await rig.makeDue([row.id]);
    expect(await rig.drain()).toMatchObject({ claimed: 1, sent: 1 });
    expect(await rowById(row.id)).toMatchObject({ status: 'sent', attempts: 2 });
    expect(rig.received().filter((m) => m.envelope.to.includes(to))).toHaveLength(1);
  });

  it('resends under the same Message-ID when a worker died between sending and recording it', async () => {
    const to = rig.address('crash');
    const row = await queue(to, 'DS-CRASH-3');
    await rig.drain();
    // Undo the "sent" record and the job's completion, as if the process died right after the SMTP server
    // accepted the mail: the job is still active when its time runs out.
    await rig.db.execute(
      sql`update outbox set status = 'pending', sent_at = null, message_id = null where id = ${row.id}`,
    );
    await rig.db.execute(
      sql`update ${rig.jobTable} set state = 'active', completed_on = null where name = 'mail' and id = ${row.id}`,
    );
    await rig.expire([row.id]);
    await rig.makeDue([row.id]);
    await rig.drain();
    const ids = rig
      .received()
      .filter((m) => m.envelope.to.includes(to))
      .map((m) => m.messageId);
    expect(ids).toEqual([`<${row.id}@dutywise>`, `<${row.id}@dutywise>`]);
  });

  it('gives up at once on a stored payload that can never render, with the reason', async () => {
    const to = rig.address('poison');
    const row = await queue(to, 'DS-POISON-4');
    await rig.db.execute(
      sql`update outbox set payload = ${JSON.stringify({ accountName: 'X' })}::jsonb where id = ${row.id}`,
    );
    expect(await rig.drain()).toMatchObject({ claimed: 1, sent: 0, dead: 1 });
    const after = await rowById(row.id);
    expect(after).toMatchObject({ status: 'dead', attempts: 1 });
    expect(after?.lastError).toMatch(/^render: datasheet-issued e-mail: props\.datasheetNumber/);
    expect(rig.received().filter((m) => m.envelope.to.includes(to))).toHaveLength(0);
  });

  it('gives up a mail whose final allowed attempt never reported back', async () => {
    const to = rig.address('abandoned');
    const row = await queue(to, 'DS-ABANDON-5');
    // The last attempt was taken by a worker that died: the job expires into the dead letters.
    await rig.db.execute(sql`update outbox set attempts = ${rig.MAX_ATTEMPTS} where id = ${row.id}`);
    await rig.db.execute(
      sql`update ${rig.jobTable} set state = 'active', started_on = now(), retry_count = retry_limit
        where name = 'mail' and id = ${row.id}`,
    );
    await rig.expire([row.id]);
    expect((await rig.drain()).dead).toBe(1);
    const after = await rowById(row.id);
    expect(after?.status).toBe('dead');
    expect(after?.lastError).toMatch(/worker stopped mid-send/);
    expect(rig.received().filter((m) => m.envelope.to.includes(to))).toHaveLength(0);
  });
});
