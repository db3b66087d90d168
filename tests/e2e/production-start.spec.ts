import { spawn } from 'node:child_process';
import path from 'node:path';
import { expect, test } from '@playwright/test';
import { DEV_DEFAULTS } from '../../lib/env';
import { e2ePorts } from './ports';
import { databaseUrl, signInFor } from './support/scenario';

const root = path.join(__dirname, '..', '..');
const appUrl = 'https://desk.vendor.example';

// The built app started as a deployment would be: every setting real except the one a case spoils. Mail and
// payments point at hosts that are not the fakes (nothing is sent in these checks).
const deployment: Record<string, string> = {
  PATH: process.env.PATH ?? '',
  HOME: process.env.HOME ?? '/tmp',
  NEXT_DIST_DIR: process.env.NEXT_DIST_DIR ?? '.next-test',
  NEXT_TELEMETRY_DISABLED: '1',
  APP_URL: appUrl,
  DATABASE_URL: databaseUrl,
  LOCAL_IDENTITY: 'on',
  SESSION_SECRET: 'k2v9q8w7e6r5t4y3u2i1o0p9a8s7d6f5g4h3-probe',
  STRIPE_SECRET_KEY: 'sk_live_probe',
  STRIPE_WEBHOOK_SECRET: 'whsec_probe',
  STRIPE_API_HOST: 'payments.vendor.example',
  STRIPE_API_PORT: '443',
  STRIPE_API_PROTOCOL: 'https',
  SMTP_HOST: 'smtp.vendor.example',
  SMTP_PORT: '587',
  LOG_LEVEL: 'warn',
};

/** Starts lib/server/serve.mjs; resolves with its exit code and stderr, or 'listening' once it answers. */
function start(
  env: Record<string, string>,
): Promise<{ outcome: number | 'listening'; stderr: string; stop: () => void }> {
  const child = spawn('node', ['lib/server/serve.mjs', '--port', String(e2ePorts.probe)], {
    cwd: root,
    env: env as NodeJS.ProcessEnv,
    stdio: 'pipe',
  });
  let stderr = '';
  child.stderr.on('data', (d) => (stderr += d));
  const stop = () => void child.kill('SIGTERM');
  return new Promise((resolve) => {
    child.on('exit', (code) => resolve({ outcome: code ?? -1, stderr, stop }));
    const poll = setInterval(async () => {
      const up = await fetch(`http://127.0.0.1:${e2ePorts.probe}/api/health`).then(
        () => true,
        () => false,
      );
      if (up) {
        clearInterval(poll);
        resolve({ outcome: 'listening', stderr, stop });
      }
    }, 300);
    child.on('exit', () => clearInterval(poll));
  });
}

const cases: [string, Record<string, string | undefined>, RegExp][] = [
  ['the committed session secret', { SESSION_SECRET: DEV_DEFAULTS.SESSION_SECRET }, /SESSION_SECRET is the committed/],
  [
    'the committed webhook secret',
    { STRIPE_WEBHOOK_SECRET: DEV_DEFAULTS.STRIPE_WEBHOOK_SECRET },
    /STRIPE_WEBHOOK_SECRET is the committed/,
  ],
  ['no identity', { LOCAL_IDENTITY: undefined }, /No identity is configured/],
  [
    'payments at the fake',
    { STRIPE_API_HOST: '127.0.0.1', STRIPE_API_PORT: '12111', STRIPE_API_PROTOCOL: 'http' },
    /Payments point at the local fake/,
  ],
  ['mail at the fake', { SMTP_HOST: '127.0.0.1', SMTP_PORT: '12025' }, /Mail points at the local fake/],
  [
    'the database owner as the app role',
    { DATABASE_URL: process.env.MIGRATION_DATABASE_URL ?? 'postgres://postgres@127.0.0.1:55433/dutywise_test' },
    /signs in as 'postgres', which is a superuser/,
  ],
];

test.describe('a production start', () => {
  test.describe.configure({ timeout: 60_000 });

  for (const [what, change, line] of cases)
    test(`refuses ${what}, saying so in one line`, async () => {
      const env = { ...deployment, ...change };
      for (const [k, v] of Object.entries(env)) if (v === undefined) delete env[k];
      const run = await start(env as Record<string, string>);
      run.stop();
      expect(run.outcome).toBe(1);
      const lines = run.stderr.split('\n').filter((l) => l.startsWith('Dutywise refuses to start: '));
      expect(lines).toHaveLength(1);
      expect(lines[0]).toMatch(line);
    });

  test('with real settings it serves: no demo sign-ins, Secure session cookies, health says only up', async () => {
    const run = await start(deployment);
    try {
      expect(run.outcome).toBe('listening');
      const base = `http://127.0.0.1:${e2ePorts.probe}`;
      const page = await (await fetch(`${base}/sign-in`)).text();
      expect(page).toContain('Sign in to your sizing desk');
      expect(page).not.toContain('demo-sign-ins');
      expect(page).not.toContain('dutywise-demo');
      expect(await (await fetch(`${base}/api/health`)).json()).toEqual({ status: 'up' });
      const signedIn = await fetch(`${base}/api/auth/sign-in`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', origin: appUrl },
        body: JSON.stringify(signInFor.support),
      });
      expect(signedIn.status).toBe(200);
      expect(signedIn.headers.get('set-cookie')).toMatch(/dw_session=.*;\s*Secure/i);
    } finally {
      run.stop();
    }
  });
});
