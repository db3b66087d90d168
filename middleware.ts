import { clerkMiddleware } from '@clerk/nextjs/server';
import { NextResponse, type NextFetchEvent, type NextRequest } from 'next/server';
import { LOCAL_SESSION_COOKIE, verifyLocalSession } from '@/lib/auth/local/session-token';
import { appHttps, clerkEnabled, env } from '@/lib/env';
import { databaseUp } from '@/lib/ops/db-status';
import { clerkFrontendApiFrom, contentSecurityPolicy } from '@/lib/security/headers';
import { unavailableJson, unavailablePage } from '@/lib/ops/unavailable';

// Coarse gate only: every page, action and handler checks the user and role again on the server.
const protectedPrefixes = [
  '/quotes',
  '/accounts',
  '/sizings',
  '/datasheets',
  '/support',
  '/billing',
  '/admin',
  '/batch',
  '/mail',
  '/api-keys',
  '/home',
];

function isProtected(pathname: string): boolean {
  return protectedPrefixes.some((p) => pathname === p || pathname.startsWith(`${p}/`));
}

const cspOptions = {
  production: env.NODE_ENV === 'production',
  https: appHttps,
  clerkFrontendApi: clerkEnabled ? clerkFrontendApiFrom(env.NEXT_PUBLIC_CLERK_PUBLISHABLE_KEY) : null,
};

/**
 * Every request gets an id made here (a client's own x-request-id is replaced, so logs cannot be forged), and every
 * page a fresh script nonce: Next reads it from the request's Content-Security-Policy and puts it on its scripts.
 */
function withRequestHeaders(req: NextRequest): NextResponse {
  const requestId = crypto.randomUUID();
  const headers = new Headers(req.headers);
  headers.set('x-request-id', requestId);
  const page = !req.nextUrl.pathname.startsWith('/api/');
  const csp = page ? contentSecurityPolicy(cspOptions, Buffer.from(crypto.randomUUID()).toString('base64')) : null;
  if (csp) headers.set('content-security-policy', csp);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set('x-request-id', requestId);
  if (csp) res.headers.set('content-security-policy', csp);
  return res;
}

// While the database cannot be reached, every page and API request that gets here answers 503 with
// Dutywise's own page (or JSON body) at once, instead of failing half-rendered. Server actions are let through:
// their wrapper answers them with the same message as a result the form can show.
async function unavailable(req: NextRequest): Promise<Response | null> {
  if (req.headers.get('next-action')) return null;
  if (await databaseUp()) return null;
  return req.nextUrl.pathname.startsWith('/api/') ? unavailableJson() : unavailablePage();
}

function toSignIn(req: NextRequest): NextResponse {
  const url = req.nextUrl.clone();
  url.pathname = '/sign-in';
  url.search = `?next=${encodeURIComponent(req.nextUrl.pathname + req.nextUrl.search)}`;
  return NextResponse.redirect(url);
}

async function localGate(req: NextRequest): Promise<NextResponse> {
  if (isProtected(req.nextUrl.pathname)) {
    const claims = await verifyLocalSession(req.cookies.get(LOCAL_SESSION_COOKIE)?.value, env.SESSION_SECRET);
    if (!claims) return toSignIn(req);
  }
  return withRequestHeaders(req);
}

// Chosen once at load: Clerk's middleware answers 500 on every route when its keys are missing.
const clerkGate = clerkEnabled
  ? clerkMiddleware(
      async (auth, req) => {
        if (isProtected(req.nextUrl.pathname)) {
          const { userId } = await auth();
          if (!userId) return toSignIn(req);
        }
        return withRequestHeaders(req);
      },
      { jwtKey: env.CLERK_JWT_KEY },
    )
  : null;

export default async function middleware(req: NextRequest, event: NextFetchEvent) {
  const down = await unavailable(req);
  if (down) return down;
  return clerkGate ? clerkGate(req, event) : localGate(req);
}

// Public machine endpoints that need no identity (the calculate API, health, payment events) skip the
// middleware: it costs more than the calculation itself under load, and each handler checks what it needs.
// The batch upload routes skip it too: Next 15.5 hands a large body that passed through Node-runtime middleware
// to the route intermittently "disturbed" (a 500 before the handler; vercel/next.js#83453, fixed only in 16).
// Those handlers sign the caller in, answer 503 when the database is down and bound the body themselves.
export const config = {
  runtime: 'nodejs',
  matcher: [
    '/((?!_next/static|_next/image|favicon.ico|api/v1/calculate|api/v1/openapi|api/v1/batch/|api/health|api/ready|api/webhooks/|.*\\.(?:png|svg|ico|woff2?)$).*)',
  ],
};
