import 'server-only';
import nodemailer, { type Transporter } from 'nodemailer';
import type SMTPTransport from 'nodemailer/lib/smtp-transport';
import { env } from '@/lib/env';

// Short timeouts: an unreachable SMTP server should fail one attempt in seconds and leave the
// message to the outbox's retry schedule, not hold a worker for the library's two-minute default.
const TIMEOUT_MS = 5_000;

const loopbackHosts = new Set(['127.0.0.1', '::1', 'localhost']);

export type SmtpSettings = { host: string; port: number; secure: boolean; user?: string; password?: string };

/** The nodemailer options for an SMTP server; plain text is allowed only on loopback (the local fake). */
export function smtpOptions(s: SmtpSettings): SMTPTransport.Options {
  const loopback = loopbackHosts.has(s.host);
  return {
    host: s.host,
    port: s.port,
    secure: s.secure,
    ignoreTLS: !s.secure && loopback,
    // Towards any other host, refuse to send mail or credentials in the clear if STARTTLS is not offered.
    requireTLS: !s.secure && !loopback,
    auth: s.user ? { user: s.user, pass: s.password ?? '' } : undefined,
    connectionTimeout: TIMEOUT_MS,
    greetingTimeout: TIMEOUT_MS,
    socketTimeout: TIMEOUT_MS,
  };
}

let transport: Transporter<SMTPTransport.SentMessageInfo> | undefined;

/** The process's one SMTP transport, configured from the environment on first use. */
export function getTransport(): Transporter<SMTPTransport.SentMessageInfo> {
  transport ??= nodemailer.createTransport(
    smtpOptions({
      host: env.SMTP_HOST,
      port: env.SMTP_PORT,
      secure: env.SMTP_SECURE,
      user: env.SMTP_USER,
      password: env.SMTP_PASSWORD,
    }),
  );
  return transport;
}

/** The Message-ID for an outbox row: stable, so a resend after a crash is recognisably the same mail. */
export function messageIdFor(outboxId: string): string {
  return `<${outboxId}@dutywise>`;
}
