// Serves the built app: Next's own request handler behind a plain node:http server. The one thing it adds is the
// address of the socket each request arrived on, written to x-dutywise-peer over anything a client sent under
// that name; lib/security/client-address.ts starts from it and believes X-Forwarded-For only hop by hop through
// TRUSTED_PROXIES. `npm start`, the demo and the browser tests run this; a production start refuses plain
// `next start`, which cannot tell the client's address from a header the client wrote.
//   node lib/server/serve.mjs [--port N]        (PORT, default 3000; BIND_ADDRESS, default every interface)
import { createServer } from 'node:http';
import { fileURLToPath } from 'node:url';
import next from 'next';

const PEER_HEADER = 'x-dutywise-peer';
const argPort = process.argv.indexOf('--port');
const port = Number(argPort > 0 ? process.argv[argPort + 1] : (process.env.PORT ?? 3000));
const bindAddress = process.env.BIND_ADDRESS || undefined;

// As `next start` does: the built app always runs as production (lib/env.ts reads it for the start checks).
process.env.NODE_ENV = 'production';
globalThis.__dutywisePeerHeader = true;
const app = next({
  dev: false,
  dir: fileURLToPath(new URL('../..', import.meta.url)),
  port,
  hostname: bindAddress ?? 'localhost',
});
const handle = app.getRequestHandler();
await app.prepare();

const server = createServer((req, res) => {
  for (let i = req.rawHeaders.length - 2; i >= 0; i -= 2)
    if (req.rawHeaders[i].toLowerCase() === PEER_HEADER) req.rawHeaders.splice(i, 2);
  req.headers[PEER_HEADER] = req.socket.remoteAddress ?? '';
  handle(req, res);
});
// Like next start: idle keep-alive connections are closed before a typical load balancer's own timeout.
server.keepAliveTimeout = 65_000;
server.listen(port, bindAddress, () => console.log(`Dutywise listening on port ${port}`));
for (const signal of ['SIGINT', 'SIGTERM'])
  process.on(signal, () => {
    server.close(() => process.exit(0));
    setTimeout(() => process.exit(0), 5_000).unref();
  });
