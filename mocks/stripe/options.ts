import Stripe from 'stripe';

export type StripeFakeOptions = {
  /** 0 picks a free port; read the chosen one from the handle. */
  port: number;
  /** Interface to listen on; loopback by default so the fake is never reachable from outside. */
  host?: string;
  webhookUrl: string;
  webhookSecret: string;
  /** Base of the checkout and portal page URLs; defaults to http://localhost:<port>. */
  publicBaseUrl?: string;
  /** JSON file that keeps state across restarts; in memory only when absent. */
  statePath?: string;
  /** Delay before each webhook retry; attempts = length + 1. */
  retryDelaysMs?: readonly number[];
  webhookTimeoutMs?: number;
  /** How long the checkout page waits for first webhook attempts before redirecting. */
  redirectWaitMs?: number;
  /** API version stamped on events; the SDK's pinned version by default. */
  apiVersion?: string;
  log?: (line: string) => void;
};

export type ResolvedOptions = Required<Omit<StripeFakeOptions, 'statePath' | 'publicBaseUrl'>> &
  Pick<StripeFakeOptions, 'statePath' | 'publicBaseUrl'>;

// Roughly doubling from half a second gives eight attempts spread over about a minute, enough
// to ride out an app restart in the demo; the hosted service retries over days instead [mem].
export const DEFAULT_RETRY_DELAYS_MS = [500, 1000, 2000, 4000, 8000, 16_000, 32_000];

/** Fills defaults and refuses options that would make the fake misbehave later. */
export function resolveOptions(options: StripeFakeOptions): ResolvedOptions {
  if (!Number.isInteger(options.port) || options.port < 0 || options.port > 65_535) {
    throw new Error(`Stripe fake: port must be an integer from 0 to 65535, got ${options.port}`);
  }
  try {
    new URL(options.webhookUrl);
  } catch {
    throw new Error(`Stripe fake: webhookUrl must be an absolute URL, got '${options.webhookUrl}'`);
  }
  if (!options.webhookSecret) throw new Error('Stripe fake: webhookSecret must not be empty');
  const retryDelaysMs = options.retryDelaysMs ?? DEFAULT_RETRY_DELAYS_MS;
  if (retryDelaysMs.some((ms) => !Number.isFinite(ms) || ms < 0)) {
    throw new Error('Stripe fake: retryDelaysMs must be non-negative numbers of milliseconds');
  }
  return {
    port: options.port,
    host: options.host ?? '127.0.0.1',
    webhookUrl: options.webhookUrl,
    webhookSecret: options.webhookSecret,
    publicBaseUrl: options.publicBaseUrl?.replace(/\/$/, ''),
    statePath: options.statePath,
    retryDelaysMs,
    webhookTimeoutMs: options.webhookTimeoutMs ?? 10_000,
    redirectWaitMs: options.redirectWaitMs ?? 3_000,
    apiVersion: options.apiVersion ?? Stripe.API_VERSION,
    log: options.log ?? ((line) => console.warn(`[stripe-fake] ${line}`)),
  };
}
