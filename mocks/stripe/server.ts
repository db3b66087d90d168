import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { StripeApiError } from './api-error';
import { Catalogue, defaultPrices } from './catalogue';
import type { FakeContext } from './context';
import { renderEvent } from './events';
import { FormParseError, parseForm, readBody } from './form-body';
import { html, json, matchRoute, type Reply, type Route, writeReply } from './http-util';
import { nowSeconds } from './ids';
import { type ResolvedOptions, resolveOptions, type StripeFakeOptions } from './options';
import { messagePage } from './pages/page-shell';
import { apiRoutes } from './routes-api';
import { controlRoutes, eventSummary, resendEvent } from './routes-control';
import { manageRoutes } from './routes-manage';
import { payRoutes } from './routes-pay';
import { StateStore } from './state-store';
import { WebhookSender } from './webhook-sender';

export type { StripeFakeOptions } from './options';

export type StripeFakeHandle = {
  /** Where the API listens, e.g. http://127.0.0.1:12111. */
  url: string;
  port: number;
  /** Base of the checkout and portal page URLs. */
  publicBaseUrl: string;
  close(): Promise<void>;
  events(): ReturnType<typeof eventSummary>[];
  resendEvent(id: string): void;
  reset(): void;
  /** Resolves true once no webhook is queued or in flight, false after the timeout. */
  webhooksIdle(timeoutMs?: number): Promise<boolean>;
};

function authError(req: IncomingMessage): StripeApiError | undefined {
  const header = req.headers.authorization ?? '';
  const key = /^Bearer\s+(\S+)$/i.exec(header)?.[1];
  if (!key) {
    return new StripeApiError(
      401,
      'invalid_request_error',
      'You did not provide an API key. Send it as a Bearer token in the Authorization header.',
    );
  }
  if (/^(sk|rk)_live_/.test(key))
    return new StripeApiError(
      401,
      'invalid_request_error',
      'The local Stripe fake refuses live keys; use a sk_test_ key.',
    );
  return undefined;
}

function errorReply(error: unknown, pathname: string, options: ResolvedOptions): Reply {
  const apiError =
    error instanceof StripeApiError
      ? error
      : error instanceof FormParseError
        ? new StripeApiError(400, 'invalid_request_error', error.message)
        : undefined;
  if (!apiError) options.log(`unexpected error on ${pathname}: ${(error as Error).stack ?? String(error)}`);
  const reply =
    apiError ?? new StripeApiError(500, 'api_error', 'The local Stripe fake hit an unexpected error; see its log.');
  if (pathname.startsWith('/pay/') || pathname.startsWith('/manage/')) {
    return html(messagePage('Page not available', reply.message), reply.statusCode);
  }
  return json(reply.toBody(), reply.statusCode);
}

async function handle(
  req: IncomingMessage,
  res: ServerResponse,
  routes: Route[],
  options: ResolvedOptions,
): Promise<void> {
  const url = new URL(req.url ?? '/', 'http://fake.invalid');
  const method = req.method ?? 'GET';
  let reply: Reply;
  try {
    if (url.pathname.startsWith('/v1/')) {
      const denied = authError(req);
      if (denied) throw denied;
    }
    const found = matchRoute(routes, method, url.pathname);
    if (!found) {
      throw new StripeApiError(
        404,
        'invalid_request_error',
        `Unrecognized request URL (${method}: ${url.pathname}). The local Stripe fake serves only the calls Dutywise makes.`,
      );
    }
    const raw = method === 'GET' ? '' : await readBody(req);
    const body = { ...parseForm(url.search.slice(1)), ...parseForm(raw) };
    reply = await found.route.handler({ req, url, params: found.params, body });
  } catch (error) {
    reply = errorReply(error, url.pathname, options);
  }
  writeReply(res, reply);
}

/** Starts the local Stripe fake: API, hosted checkout and portal pages, signed webhooks. */
export async function startStripeFake(input: StripeFakeOptions): Promise<StripeFakeHandle> {
  const options = resolveOptions(input);
  const store = new StateStore(options.statePath);
  const sender = new WebhookSender({
    url: options.webhookUrl,
    secret: options.webhookSecret,
    retryDelaysMs: options.retryDelaysMs,
    timeoutMs: options.webhookTimeoutMs,
    findEvent: (id) => store.findEvent(id),
    renderEvent,
    onAttempt: () => store.save(),
    log: options.log,
  });
  const ctx: FakeContext = {
    store,
    sender,
    catalogue: new Catalogue(defaultPrices, nowSeconds()),
    apiVersion: options.apiVersion,
    publicBaseUrl: options.publicBaseUrl ?? '',
    redirectWaitMs: options.redirectWaitMs,
  };
  const reset = () => {
    sender.clear();
    store.reset();
  };
  const routes: Route[] = [...apiRoutes(ctx), ...payRoutes(ctx), ...manageRoutes(ctx), ...controlRoutes(ctx, reset)];
  const server = createServer((req, res) => void handle(req, res, routes, options));
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, options.host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  const port = (server.address() as AddressInfo).port;
  ctx.publicBaseUrl = options.publicBaseUrl ?? `http://localhost:${port}`;
  // Deliveries cut short by a restart carry on, as Stripe keeps retrying while an endpoint is down.
  for (const event of store.state.events) if (event.delivery.status === 'pending') sender.enqueue(event.id);

  return {
    url: `http://${options.host.includes(':') ? `[${options.host}]` : options.host}:${port}`,
    port,
    publicBaseUrl: ctx.publicBaseUrl,
    events: () => store.state.events.map(eventSummary),
    resendEvent: (id) => void resendEvent(ctx, id),
    reset,
    webhooksIdle: (timeoutMs = 30_000) => sender.idle(timeoutMs),
    close: async () => {
      sender.close();
      store.save();
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
    },
  };
}
