import type { SmtpFakeOptions } from './server';

function portFrom(value: string | undefined, fallback: number, name: string): number {
  if (value === undefined || value === '') return fallback;
  const port = Number(value);
  if (!Number.isInteger(port) || port < 0 || port > 65_535)
    throw new Error(`${name} must be a port number from 0 to 65535, got '${value}'`);
  return port;
}

/** Options for the CLI and the combined start script, from the process environment. */
export function smtpFakeOptionsFromEnv(env: NodeJS.ProcessEnv): SmtpFakeOptions {
  return {
    smtpPort: portFrom(env.SMTP_FAKE_PORT, 12_025, 'SMTP_FAKE_PORT'),
    httpPort: portFrom(env.SMTP_FAKE_HTTP_PORT, 12_026, 'SMTP_FAKE_HTTP_PORT'),
    host: env.SMTP_FAKE_HOST || '127.0.0.1',
    statePath: env.SMTP_FAKE_STATE || undefined,
  };
}
