import { DEV_DEFAULTS } from '@/lib/env';
import { parseTrustedProxies } from './client-address';

// What a deployment must not start with. Pure, so tests feed it settings directly; lib/security/start-check.ts
// applies it when the server (and the job worker) starts.

export type StartSettings = {
  NODE_ENV: string;
  APP_URL: string;
  DEMO_MODE: boolean;
  LOCAL_IDENTITY?: boolean;
  DATABASE_URL: string;
  SESSION_SECRET: string;
  STRIPE_SECRET_KEY: string;
  STRIPE_WEBHOOK_SECRET: string;
  STRIPE_API_HOST: string;
  STRIPE_API_PORT: number;
  STRIPE_API_PROTOCOL: string;
  SMTP_HOST: string;
  SMTP_PORT: number;
  MAIL_FAKE_INBOX_URL?: string;
  TRUSTED_PROXIES: string;
};

const LOOPBACK = /^(localhost|127(\.\d+){3}|\[?::1\]?)$/i;
const FAKE_PORTS = { stripe: [12111, 12211], smtp: [12025, 12125] };

/** True for a production build or a public https address: the settings below must then be real. */
export function isProductionStart(s: Pick<StartSettings, 'NODE_ENV' | 'APP_URL'>): boolean {
  return s.NODE_ENV === 'production' || s.APP_URL.startsWith('https://');
}

function demoProblems(s: StartSettings): string[] {
  const url = new URL(s.APP_URL);
  return url.protocol === 'http:' && LOOPBACK.test(url.hostname)
    ? []
    : [`DEMO_MODE=on is for the demo on this machine only, but APP_URL is ${url.origin}: turn DEMO_MODE off.`];
}

/**
 * A start whose settings ask for more than the build carries: Clerk's client code is in a build only when
 * NEXT_PUBLIC_CLERK_PUBLISHABLE_KEY was set while building (next.config.ts), so Clerk keys at start need it.
 */
export function buildProblems(ctx: { clerk: boolean; clerkInBuild: boolean }): string[] {
  return ctx.clerk && !ctx.clerkInBuild
    ? [
        'The Clerk keys are set, but this build was made without NEXT_PUBLIC_CLERK_PUBLISHABLE_KEY and carries no Clerk sign-in: build again with it set.',
      ]
    : [];
}

/**
 * One line per setting that still holds a committed development value or points at a local fake, for a
 * production start; none otherwise. `server` adds what only the web server needs.
 */
export function productionProblems(s: StartSettings, ctx: { clerk: boolean; server: boolean; peerHeader: boolean }) {
  if (!isProductionStart(s)) return [];
  if (s.DEMO_MODE) return demoProblems(s);
  const out: string[] = [];
  const url = new URL(s.APP_URL);
  if (url.protocol !== 'https:')
    out.push(`APP_URL is ${url.origin}: a deployment is served over https (session cookies are sent only there).`);
  if (s.SESSION_SECRET === DEV_DEFAULTS.SESSION_SECRET)
    out.push('SESSION_SECRET is the committed development value: set at least 32 random characters.');
  if (s.STRIPE_WEBHOOK_SECRET === DEV_DEFAULTS.STRIPE_WEBHOOK_SECRET)
    out.push("STRIPE_WEBHOOK_SECRET is the committed development value: set the endpoint's signing secret.");
  if (s.STRIPE_SECRET_KEY === DEV_DEFAULTS.STRIPE_SECRET_KEY)
    out.push('STRIPE_SECRET_KEY is the committed development value: set the secret API key.');
  if (
    LOOPBACK.test(s.STRIPE_API_HOST) ||
    s.STRIPE_API_PROTOCOL !== 'https' ||
    FAKE_PORTS.stripe.includes(s.STRIPE_API_PORT)
  )
    out.push(
      `Payments point at the local fake (${s.STRIPE_API_PROTOCOL}://${s.STRIPE_API_HOST}:${s.STRIPE_API_PORT}): set STRIPE_API_HOST, STRIPE_API_PORT and STRIPE_API_PROTOCOL.`,
    );
  if (LOOPBACK.test(s.SMTP_HOST) || FAKE_PORTS.smtp.includes(s.SMTP_PORT))
    out.push(`Mail points at the local fake (${s.SMTP_HOST}:${s.SMTP_PORT}): set SMTP_HOST and SMTP_PORT.`);
  if (s.MAIL_FAKE_INBOX_URL) out.push('MAIL_FAKE_INBOX_URL is set: it serves the demo inbox; leave it unset.');
  if (!ctx.clerk && !s.LOCAL_IDENTITY)
    out.push(
      'No identity is configured: set the Clerk keys (NEXT_PUBLIC_CLERK_PUBLISHABLE_KEY, CLERK_SECRET_KEY), or LOCAL_IDENTITY=on for local passwords.',
    );
  if (s.DATABASE_URL === DEV_DEFAULTS.DATABASE_URL || /:dutywise-app-local@/.test(s.DATABASE_URL))
    out.push("DATABASE_URL uses the local cluster's development password: connect with the app role's own password.");
  try {
    parseTrustedProxies(s.TRUSTED_PROXIES);
  } catch (err) {
    out.push((err as Error).message);
  }
  if (ctx.server && !ctx.peerHeader)
    out.push(
      'Start the app with `npm start` (lib/server/serve.mjs): plain `next start` cannot tell a client from its headers.',
    );
  return out;
}
