import { describe, expect, it } from 'vitest';
import { messageIdFor, smtpOptions } from '@/lib/email/transport';

describe('SMTP transport settings', () => {
  it('allows plain SMTP without STARTTLS only towards loopback', () => {
    expect(smtpOptions({ host: '127.0.0.1', port: 12025, secure: false })).toMatchObject({
      host: '127.0.0.1',
      port: 12025,
      secure: false,
      ignoreTLS: true,
      auth: undefined,
    });
    expect(smtpOptions({ host: 'localhost', port: 25, secure: false }).ignoreTLS).toBe(true);
    // A remote relay must upgrade with STARTTLS before anything is sent.
    expect(smtpOptions({ host: 'smtp.relay.example', port: 587, secure: false })).toMatchObject({
      ignoreTLS: false,
      requireTLS: true,
    });
    expect(smtpOptions({ host: '127.0.0.1', port: 12025, secure: false }).requireTLS).toBe(false);
    expect(smtpOptions({ host: 'smtp.relay.example', port: 465, secure: true })).toMatchObject({
      secure: true,
      ignoreTLS: false,
    });
  });

  it('authenticates only when a user is configured, and times out in seconds', () => {
    expect(
      smtpOptions({ host: 'smtp.relay.example', port: 587, secure: false, user: 'desk', password: 'pw' }).auth,
    ).toEqual({ user: 'desk', pass: 'pw' });
    const o = smtpOptions({ host: 'smtp.relay.example', port: 587, secure: false });
    expect(o.auth).toBeUndefined();
    expect([o.connectionTimeout, o.greetingTimeout, o.socketTimeout]).toEqual([5_000, 5_000, 5_000]);
  });

  it('derives the Message-ID from the outbox row id', () => {
    expect(messageIdFor('0b8f0c64-5d0e-4c35-9b0a-8f2f5e1a9c11')).toBe(
      '<0b8f0c64-5d0e-4c35-9b0a-8f2f5e1a9c11@dutywise>',
    );
  });
});
