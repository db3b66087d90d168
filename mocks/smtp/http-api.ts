import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import { renderInboxPage } from './inbox-page';
import { inboxLimit, inboxView } from './inbox-view';
import type { MessageStore, StoredMessage } from './message-store';

export type InboxApi = { port: number; close(): Promise<void> };

function sendJson(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { 'content-type': 'application/json; charset=utf-8', 'cache-control': 'no-store' });
  res.end(JSON.stringify(body, null, 2));
}

/** List entries leave out bodies so polling stays cheap; GET /messages/:id has everything. */
function summary(message: StoredMessage) {
  const { id, receivedAt, from, to, cc, subject, date, messageId, envelope } = message;
  return { id, receivedAt, from, to, cc, subject, date, messageId, envelope };
}

function handle(req: IncomingMessage, res: ServerResponse, store: MessageStore, smtpUp: () => boolean): void {
  const url = new URL(req.url ?? '/', 'http://fake.invalid');
  const method = req.method ?? 'GET';
  const path = url.pathname.replace(/\/$/, '') || '/';
  const one = /^\/messages\/([^/]+)(\/html)?$/.exec(path);
  if (method === 'GET' && path === '/health')
    return sendJson(res, 200, {
      ok: true,
      service: 'smtp-fake',
      smtp: smtpUp() ? 'up' : 'stopped',
      messages: store.list().length,
    });
  if (method === 'GET' && path === '/messages') {
    const to = url.searchParams.get('to')?.toLowerCase();
    const messages = store
      .list()
      .filter((m) => !to || [...m.to, ...m.cc, ...m.envelope.to].some((a) => a.toLowerCase() === to));
    return sendJson(res, 200, { data: messages.map(summary) });
  }
  if (method === 'GET' && path === '/inbox')
    return sendJson(res, 200, inboxView(store.list(), inboxLimit(url.searchParams.get('limit'))));
  if (method === 'DELETE' && path === '/messages') return sendJson(res, 200, { deleted: store.clear() });
  if (method === 'GET' && one) {
    const message = store.get(one[1] ?? '');
    if (!message) return sendJson(res, 404, { error: `No message with id '${one[1]}'.` });
    if (!one[2]) return sendJson(res, 200, message);
    // Shown as received, but sandboxed: mail HTML must not run script on this origin.
    res.writeHead(200, {
      'content-type': 'text/html; charset=utf-8',
      'content-security-policy': "sandbox; default-src data: 'unsafe-inline'",
    });
    res.end(
      message.html ??
        `<pre>${(message.text ?? '').replace(/[&<>]/g, (ch) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;' })[ch] ?? ch)}</pre>`,
    );
    return;
  }
  if (method === 'GET' && path === '/') {
    res.writeHead(200, { 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' });
    res.end(renderInboxPage(store.list()));
    return;
  }
  sendJson(res, 404, {
    error: `No route ${method} ${url.pathname}. Try GET /messages, GET /messages/:id, GET /inbox, DELETE /messages, GET /health.`,
  });
}

/** The JSON inbox API (and a human page at /) over the message store. */
export async function listenInboxApi(options: {
  port: number;
  host: string;
  store: MessageStore;
  smtpUp: () => boolean;
}): Promise<InboxApi> {
  const server: Server = createServer((req, res) => handle(req, res, options.store, options.smtpUp));
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(options.port, options.host, () => {
      server.off('error', reject);
      resolve();
    });
  });
  return {
    port: (server.address() as AddressInfo).port,
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      }),
  };
}
