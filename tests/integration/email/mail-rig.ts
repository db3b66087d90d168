import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { vi } from 'vitest';
import { startSmtpFake, type SmtpFakeHandle, type StoredMessage } from '@/mocks/smtp/server';
import type { EmailProps } from '@/lib/email/catalogue';

// Each test file gets its own SMTP fake on free ports and its own recipient domain, so files can
// share the test database in parallel: drains are scoped to the domain and the fake is filtered by it.
export type MailRig = Awaited<ReturnType<typeof startMailRig>>;

export async function startMailRig() {
  const fake: SmtpFakeHandle = await startSmtpFake({ smtpPort: 0, httpPort: 0, log: () => undefined });
  vi.stubEnv('SMTP_HOST', '127.0.0.1');
  vi.stubEnv('SMTP_PORT', String(fake.smtpPort));
  vi.stubEnv('SMTP_SECURE', 'false');
  vi.stubEnv('SMTP_USER', '');
  vi.stubEnv('MAIL_FROM', 'Dutywise test <desk@dutywise.test>');
  // Outcomes are asserted from the outbox rows; the worker's warnings would only be noise here.
  vi.stubEnv('LOG_LEVEL', 'fatal');
  // Modules read lib/env when first loaded: load them fresh, after the fake's port is known.
  vi.resetModules();
  const { db } = await import('@/db');
  const { enqueueEmail } = await import('@/lib/email/enqueue');
  const { drainOutbox } = await import('@/lib/email/drain');
  const { MAX_ATTEMPTS } = await import('@/lib/email/outbox-claims');
  const domain = `${randomUUID().slice(0, 8)}.mail.test`;
  const scope = `%@${domain}`;
  return {
    fake,
    db,
    enqueueEmail,
    MAX_ATTEMPTS,
    domain,
    /** A recipient address unique to this file and call. */
    address: (name = 'buyer') => `${name}-${randomUUID().slice(0, 6)}@${domain}`,
    drain: (opts: { limit?: number; workerId?: string; now?: Date } = {}) =>
      drainOutbox({ limit: 20, ...opts, toAddressLike: scope }),
    received: (): StoredMessage[] => fake.messages().filter((m) => m.envelope.to.some((a) => a.endsWith(`@${domain}`))),
    async close() {
      // Leave nothing behind for other files' drains to pick up.
      await db.execute(sql`delete from outbox where to_address like ${scope}`);
      await fake.close();
      vi.unstubAllEnvs();
    },
  };
}

/** Drains until a pass claims nothing; returns how many were sent in total. */
export async function drainAll(rig: MailRig, opts: { limit?: number; workerId?: string } = {}): Promise<number> {
  let sent = 0;
  for (let pass = 0; pass < 100; pass += 1) {
    const r = await rig.drain(opts);
    sent += r.sent;
    if (r.claimed === 0) return sent;
  }
  throw new Error('outbox did not empty in 100 passes');
}

export const datasheetProps = (number: string): EmailProps['datasheet-issued'] => ({
  accountName: 'Stennick Gas Storage',
  datasheetNumber: number,
  revision: 'A',
  sizingTitle: 'Regeneration gas heater',
  equipmentTag: 'H-310',
  datasheetUrl: `/datasheets/${number}`,
});
