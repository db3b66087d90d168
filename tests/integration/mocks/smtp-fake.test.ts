import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import nodemailer from 'nodemailer';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { type SmtpFakeHandle, type StoredMessage, startSmtpFake } from '@/mocks/smtp/server';

let fake: SmtpFakeHandle;
beforeEach(async () => {
  fake = await startSmtpFake({ smtpPort: 0, httpPort: 0, log: () => undefined });
});
afterEach(async () => {
  await fake.close();
});

function transportTo(port: number, auth?: { user: string; pass: string }) {
  return nodemailer.createTransport({ host: '127.0.0.1', port, secure: false, ignoreTLS: true, auth });
}

async function getJson<T>(path: string): Promise<{ status: number; body: T }> {
  const response = await fetch(`${fake.httpUrl}${path}`);
  return { status: response.status, body: (await response.json()) as T };
}

const datasheetMail = {
  from: 'Dutywise <desk@dutywise.invalid>',
  to: 'Ilse Marrow <ilse@kestrel-thermal.example>',
  cc: 'records@kestrel-thermal.example',
  bcc: 'audit@dutywise.invalid',
  subject: 'Datasheet DS-0042 rev B issued',
  text: 'Datasheet DS-0042 revision B is ready.',
  html: '<p>Datasheet <strong>DS-0042</strong> revision B is ready.</p>',
  attachments: [{ filename: 'DS-0042-B.pdf', content: Buffer.from('%PDF-1.7 test'), contentType: 'application/pdf' }],
};

describe('SMTP fake', () => {
  it('receives a message sent with nodemailer and serves it over HTTP', async () => {
    const info = await transportTo(fake.smtpPort).sendMail(datasheetMail);
    const list = await getJson<{ data: StoredMessage[] }>('/messages');
    expect(list.status).toBe(200);
    expect(list.body.data).toHaveLength(1);
    const id = list.body.data[0]?.id ?? '';
    const { body: message } = await getJson<StoredMessage>(`/messages/${id}`);
    expect(message.from).toBe('desk@dutywise.invalid');
    expect(message.to).toEqual(['ilse@kestrel-thermal.example']);
    expect(message.cc).toEqual(['records@kestrel-thermal.example']);
    expect(message.envelope.to).toContain('audit@dutywise.invalid');
    expect(message.subject).toBe(datasheetMail.subject);
    expect(message.text?.trim()).toBe(datasheetMail.text);
    expect(message.html).toContain('<strong>DS-0042</strong>');
    expect(message.messageId).toBe(info.messageId);
    expect(message.headers['message-id']).toBe(info.messageId);
    expect(Number.isNaN(Date.parse(message.date ?? ''))).toBe(false);
    expect(message.attachments).toEqual([{ filename: 'DS-0042-B.pdf', contentType: 'application/pdf', sizeBytes: 13 }]);
    expect(fake.messages().map((m) => m.id)).toEqual([id]);
  });

  it('accepts any credentials as well as none', async () => {
    await transportTo(fake.smtpPort, { user: 'dutywise', pass: 'anything' }).sendMail({
      ...datasheetMail,
      subject: 'with auth',
    });
    await transportTo(fake.smtpPort).sendMail({ ...datasheetMail, subject: 'without auth' });
    expect(fake.messages().map((m) => m.subject)).toEqual(['with auth', 'without auth']);
  });

  it('filters by recipient, clears, and reports health', async () => {
    await transportTo(fake.smtpPort).sendMail(datasheetMail);
    await transportTo(fake.smtpPort).sendMail({
      ...datasheetMail,
      to: 'someone@harrow-gas.example',
      cc: undefined,
      bcc: undefined,
    });
    expect((await getJson<{ data: unknown[] }>('/messages?to=someone@harrow-gas.example')).body.data).toHaveLength(1);
    expect((await getJson<{ ok: boolean; messages: number }>('/health')).body).toMatchObject({
      ok: true,
      smtp: 'up',
      messages: 2,
    });
    const cleared = await fetch(`${fake.httpUrl}/messages`, { method: 'DELETE' });
    expect(await cleared.json()).toEqual({ deleted: 2 });
    expect((await getJson<{ data: unknown[] }>('/messages')).body.data).toHaveLength(0);
    expect((await getJson<{ error: string }>('/messages/nope')).status).toBe(404);
  });

  it('serves the demo inbox view: newest first, with text, capped by ?limit=', async () => {
    for (const subject of ['first', 'second', 'third'])
      await transportTo(fake.smtpPort).sendMail({ ...datasheetMail, subject });
    type View = { total: number; messages: { id: string; subject: string; text: string | null; htmlPath: string }[] };
    const all = await getJson<View>('/inbox');
    expect(all.body.total).toBe(3);
    expect(all.body.messages.map((m) => m.subject)).toEqual(['third', 'second', 'first']);
    expect(all.body.messages[0]?.text?.trim()).toBe(datasheetMail.text);
    const html = await fetch(`${fake.httpUrl}${all.body.messages[0]?.htmlPath}`);
    expect(await html.text()).toContain('<strong>DS-0042</strong>');
    const two = await getJson<View>('/inbox?limit=2');
    expect(two.body).toMatchObject({ total: 3 });
    expect(two.body.messages.map((m) => m.subject)).toEqual(['third', 'second']);
    expect((await getJson<View>('/inbox?limit=zero')).body.messages).toHaveLength(3);
  });

  it('lists mail on an HTML page with subjects escaped', async () => {
    await transportTo(fake.smtpPort).sendMail({ ...datasheetMail, subject: 'Quote <Q-7> & terms' });
    const page = await (await fetch(`${fake.httpUrl}/`)).text();
    expect(page).toContain('Quote &lt;Q-7&gt; &amp; terms');
    expect(page).not.toContain('<Q-7>');
  });

  it('refuses mail while SMTP is stopped and accepts it again on the same port', async () => {
    await transportTo(fake.smtpPort).sendMail({ ...datasheetMail, subject: 'before' });
    await fake.stopSmtp();
    expect((await getJson<{ smtp: string }>('/health')).body.smtp).toBe('stopped');
    await expect(transportTo(fake.smtpPort).sendMail({ ...datasheetMail, subject: 'during' })).rejects.toMatchObject({
      code: 'ESOCKET',
    });
    await fake.startSmtp();
    await transportTo(fake.smtpPort).sendMail({ ...datasheetMail, subject: 'after' });
    expect(fake.messages().map((m) => m.subject)).toEqual(['before', 'after']);
  });

  it('closes fully and starts again on the same ports', async () => {
    const { smtpPort, httpPort } = fake;
    await fake.close();
    fake = await startSmtpFake({ smtpPort, httpPort, log: () => undefined });
    expect(fake.smtpPort).toBe(smtpPort);
    await transportTo(smtpPort).sendMail(datasheetMail);
    expect((await getJson<{ data: unknown[] }>('/messages')).body.data).toHaveLength(1);
  });

  it('keeps received mail across a restart when given a state file', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'dutywise-smtp-fake-'));
    try {
      const statePath = join(dir, 'mail.json');
      await fake.close();
      fake = await startSmtpFake({ smtpPort: 0, httpPort: 0, statePath, log: () => undefined });
      await transportTo(fake.smtpPort).sendMail(datasheetMail);
      await fake.close();
      fake = await startSmtpFake({ smtpPort: 0, httpPort: 0, statePath, log: () => undefined });
      expect(fake.messages().map((m) => m.subject)).toEqual([datasheetMail.subject]);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('refuses an invalid port with the option named', async () => {
    await expect(startSmtpFake({ smtpPort: -1, httpPort: 0 })).rejects.toThrow(/smtpPort/);
  });
});
