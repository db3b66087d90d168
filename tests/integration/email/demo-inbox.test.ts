import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startSmtpFake } from '@/mocks/smtp/server';
import { datasheetProps, drainAll, startMailRig, type MailRig } from './mail-rig';

// The demo's mail page reads the SMTP fake's GET /inbox through lib/email/demo-inbox; these check what it is given.
let rig: MailRig;
beforeAll(async () => {
  rig = await startMailRig();
});
afterAll(async () => {
  await rig.close();
});

describe('reading the demo inbox', () => {
  it('lists received mail newest first with its text body and a link to the HTML', async () => {
    const { readDemoInbox } = await import('@/lib/email/demo-inbox');
    const first = rig.address('inbox1');
    const second = rig.address('inbox2');
    await rig.db.transaction((tx) =>
      rig.enqueueEmail(tx, { template: 'datasheet-issued', to: first, props: datasheetProps('DS-INBOX-1') }),
    );
    await drainAll(rig);
    await rig.db.transaction((tx) =>
      rig.enqueueEmail(tx, { template: 'datasheet-issued', to: second, props: datasheetProps('DS-INBOX-2') }),
    );
    await drainAll(rig);
    const inbox = await readDemoInbox(rig.fake.httpUrl);
    if (inbox.state !== 'ok') throw new Error(`inbox state ${inbox.state}`);
    const mine = inbox.messages.filter((m) => m.to.some((a) => a === first || a === second));
    expect(mine.map((m) => m.to[0])).toEqual([second, first]);
    expect(mine[0]?.subject).toBe('Datasheet DS-INBOX-2 rev. A issued');
    expect(mine[0]?.text).toContain('DS-INBOX-2');
    expect(mine[0]?.htmlUrl).toBe(`${rig.fake.httpUrl}/messages/${mine[0]?.id}/html`);
    const html = await fetch(mine[0]?.htmlUrl ?? '').then((r) => r.text());
    expect(html).toContain('DS-INBOX-2');
  });

  it('says so when no inbox is configured or the fake is not answering, without throwing', async () => {
    const { readDemoInbox } = await import('@/lib/email/demo-inbox');
    expect(await readDemoInbox(undefined)).toEqual({ state: 'unconfigured' });
    const gone = await startSmtpFake({ smtpPort: 0, httpPort: 0, log: () => undefined });
    const url = gone.httpUrl;
    await gone.close();
    const down = await readDemoInbox(url);
    expect(down).toMatchObject({ state: 'unreachable', url });
    const notInbox = await readDemoInbox(`${rig.fake.httpUrl}/health`);
    expect(notInbox).toMatchObject({ state: 'unreachable' });
  });
});
