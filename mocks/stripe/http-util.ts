import type { IncomingMessage, ServerResponse } from 'node:http';
import type { FormObject } from './form-body';
import { newId } from './ids';

export type Reply =
  | { kind: 'json'; status: number; body: unknown }
  | { kind: 'html'; status: number; html: string }
  | { kind: 'redirect'; location: string };

export type RouteRequest = {
  req: IncomingMessage;
  url: URL;
  /** Path parameters in the order they appear in the route pattern. */
  params: string[];
  /** Form body for POST/DELETE, query string for GET, both parsed into nested objects. */
  body: FormObject;
};

export type RouteHandler = (request: RouteRequest) => Reply | Promise<Reply>;
export type Route = { method: string; pattern: RegExp; handler: RouteHandler };

export const json = (body: unknown, status = 200): Reply => ({ kind: 'json', status, body });
export const html = (markup: string, status = 200): Reply => ({ kind: 'html', status, html: markup });
export const redirect = (location: string): Reply => ({ kind: 'redirect', location });

/** A route from a path such as `/v1/customers/:id`; each `:name` captures one path segment. */
export function route(method: string, path: string, handler: RouteHandler): Route {
  const source = path.replace(/[.*+?^${}()|[\]\\]/g, '\\$&').replace(/:[a-zA-Z]+/g, '([^/]+)');
  return { method, pattern: new RegExp(`^${source}$`), handler };
}

export function matchRoute(
  routes: readonly Route[],
  method: string,
  pathname: string,
): { route: Route; params: string[] } | undefined {
  for (const candidate of routes) {
    if (candidate.method !== method) continue;
    const match = candidate.pattern.exec(pathname);
    if (match) return { route: candidate, params: match.slice(1).map((p) => decodeURIComponent(p)) };
  }
  return undefined;
}

export function writeReply(res: ServerResponse, reply: Reply): void {
  res.setHeader('cache-control', 'no-store');
  if (reply.kind === 'redirect') {
    // 303 makes the browser follow with GET after the form POST.
    res.writeHead(303, { location: reply.location });
    res.end();
    return;
  }
  if (reply.kind === 'html') {
    res.writeHead(reply.status, { 'content-type': 'text/html; charset=utf-8' });
    res.end(reply.html);
    return;
  }
  res.writeHead(reply.status, { 'content-type': 'application/json; charset=utf-8', 'request-id': newId('req', 14) });
  res.end(JSON.stringify(reply.body, null, 2));
}
