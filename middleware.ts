import { clerkMiddleware } from '@clerk/nextjs/server';
import { NextResponse, type NextFetchEvent, type NextRequest } from 'next/server';
import { LOCAL_SESSION_COOKIE, verifyLocalSession } from '@/lib/auth/local/session-token';
import { clerkEnabled, env } from '@/lib/env';
import { databaseUp } from '@/lib/ops/db-status';

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
  '/home',
];

function isProtected(pathname: string): boolean {
  return protectedPrefixes.some((p) => pathname === p || pathname.startsWith(`${p}/`));
}

function withRequestId(req: NextRequest): NextResponse {
  const requestId = req.headers.get('x-request-id') ?? crypto.randomUUID();
  const headers = new Headers(req.headers);
  headers.set('x-request-id', requestId);
  const res = NextResponse.next({ request: { headers } });
  res.headers.set('x-request-id', requestId);
  return res;
}

// Pages that read the database; their requests get an immediate 503 page while it is unreachable.
function needsDatabase(pathname: string): boolean {
  return isProtected(pathname) || pathname === '/size' || pathname.startsWith('/invite/') || pathname === '/sign-up';
}

const unavailablePage = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Dutywise is unavailable</title></head>
<body style="font-family:system-ui,sans-serif;max-width:36rem;margin:4rem auto;padding:0 1rem;color:#1c232b;background:#f6f4ef">
<h1>Dutywise cannot reach its database</h1><p>Nothing you saved is lost. The desk will answer again as soon as the database is back; try again in a minute.</p>
</body></html>`;

async function unavailable(req: NextRequest): Promise<NextResponse | null> {
  if (req.method !== 'GET' || !needsDatabase(req.nextUrl.pathname) || req.headers.get('rsc')) return null;
  if (await databaseUp()) return null;
  return new NextResponse(unavailablePage, {
    status: 503,
    headers: { 'content-type': 'text/html; charset=utf-8', 'retry-after': '10', 'cache-control': 'no-store' },
  });
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
  return withRequestId(req);
}

// Chosen once at load: Clerk's middleware answers 500 on every route when its keys are missing.
const clerkGate = clerkEnabled
  ? clerkMiddleware(
      async (auth, req) => {
        if (isProtected(req.nextUrl.pathname)) {
          const { userId } = await auth();
          if (!userId) return toSignIn(req);
        }
        return withRequestId(req);
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
export const config = {
  runtime: 'nodejs',
  matcher: [
    '/((?!_next/static|_next/image|favicon.ico|api/v1/calculate|api/v1/openapi|api/v1/batch/template|api/health|api/ready|api/webhooks/|.*\\.(?:png|svg|ico|woff2?)$).*)',
  ],
};
