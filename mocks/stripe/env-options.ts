import type { StripeFakeOptions } from './options';

function portFrom(value: string | undefined, fallback: number, name: string): number {
  if (value === undefined || value === '') return fallback;
  const port = Number(value);
  if (!Number.isInteger(port) || port < 0 || port > 65_535)
    throw new Error(`${name} must be a port number from 0 to 65535, got '${value}'`);
  return port;
}

/** Options for the CLI and the combined start script, from the process environment. */
export function stripeFakeOptionsFromEnv(env: NodeJS.ProcessEnv): StripeFakeOptions {
  return {
    port: portFrom(env.STRIPE_FAKE_PORT, 12_111, 'STRIPE_FAKE_PORT'),
    host: env.STRIPE_FAKE_HOST || '127.0.0.1',
    webhookUrl: env.STRIPE_WEBHOOK_URL || 'http://localhost:3000/api/webhooks/stripe',
    webhookSecret: env.STRIPE_WEBHOOK_SECRET || 'whsec_dutywise_local',
    publicBaseUrl: env.STRIPE_FAKE_PUBLIC_URL || undefined,
    statePath: env.STRIPE_FAKE_STATE || undefined,
  };
}
