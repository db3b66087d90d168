// Response security headers for every route. Kept free of framework imports so next.config.ts can use it.

export type HeaderOptions = { production: boolean; https: boolean; clerkFrontendApi?: string | null };

/**
 * The page Content-Security-Policy for one response. Scripts run only with this response's nonce (middleware makes
 * a fresh one per request and Next puts it on every script it renders); 'strict-dynamic' lets those scripts load
 * the app's chunks. 'unsafe-eval' is only for the development server. Clerk's frontend host is allowed only when
 * Clerk is on.
 */
export function contentSecurityPolicy(opts: HeaderOptions, nonce: string): string {
  const clerk = opts.clerkFrontendApi ? ` https://${opts.clerkFrontendApi}` : '';
  const script = `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${opts.production ? '' : " 'unsafe-eval'"}${clerk}`;
  return [
    "default-src 'self'",
    script,
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:" + (clerk ? ' https://img.clerk.com' : ''),
    "font-src 'self' data:",
    `connect-src 'self'${clerk}`,
    `frame-src 'self'${clerk}`,
    "worker-src 'self' blob:",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

// Headers every response gets. None of these values holds a ':', which matters for speed: Next compiles a
// header value that holds one as a path template on every request.
function commonHeaders(opts: HeaderOptions): { key: string; value: string }[] {
  const headers = [
    { key: 'X-Content-Type-Options', value: 'nosniff' },
    { key: 'Referrer-Policy', value: 'strict-origin-when-cross-origin' },
    { key: 'X-Frame-Options', value: 'DENY' },
    { key: 'Permissions-Policy', value: 'camera=(), microphone=(), geolocation=(), payment=()' },
    { key: 'Cross-Origin-Opener-Policy', value: 'same-origin' },
  ];
  if (opts.production && opts.https)
    headers.push({ key: 'Strict-Transport-Security', value: 'max-age=63072000; includeSubDomains' });
  return headers;
}

/** Headers for pages and assets; the page Content-Security-Policy comes from middleware, with its nonce. */
export function securityHeaders(opts: HeaderOptions): { key: string; value: string }[] {
  return commonHeaders(opts);
}

/** The policy for JSON, CSV and PDF answers of the API: they load nothing and are never framed. */
export const API_CONTENT_SECURITY_POLICY = "default-src 'none'; frame-ancestors 'none'";

/** Headers for /api/*: nothing there renders a page, so the strictest policy applies. */
export function apiSecurityHeaders(opts: HeaderOptions): { key: string; value: string }[] {
  return [{ key: 'Content-Security-Policy', value: API_CONTENT_SECURITY_POLICY }, ...commonHeaders(opts)];
}

/** Clerk's frontend API host is the base64 text of the publishable key after its prefix, less the trailing '$'. */
export function clerkFrontendApiFrom(publishableKey: string | undefined): string | null {
  const m = publishableKey?.match(/^pk_(test|live)_(.+)$/);
  if (!m?.[2]) return null;
  const host = Buffer.from(m[2], 'base64').toString('utf8').replace(/\$$/, '');
  return /^[a-z0-9.-]+$/i.test(host) ? host : null;
}
