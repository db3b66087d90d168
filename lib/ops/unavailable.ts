// What Dutywise answers while its database cannot be reached: one page for people, one JSON body for
// machines, the same words in both. Pure strings, so middleware can send them without rendering anything.

/** Seconds a client is told to wait before trying again. */
export const UNAVAILABLE_RETRY_AFTER_S = 30;

/** The sentence every 503 carries: what happened, that nothing is lost, what to do. */
export const UNAVAILABLE_MESSAGE =
  'Dutywise is temporarily unavailable: it cannot reach its database. Nothing you saved was lost. Try again in a minute.';

const headers = {
  'retry-after': String(UNAVAILABLE_RETRY_AFTER_S),
  'cache-control': 'no-store',
};

// Self-contained (no scripts, no stylesheet requests): it must show even when nothing else can be served.
const page = `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Temporarily unavailable · Dutywise</title><meta name="robots" content="noindex"></head>
<body style="margin:0;min-height:100vh;background:#f6f4ef;color:#1c232b;font-family:'IBM Plex Sans',system-ui,sans-serif">
<header style="border-bottom:1px solid #d9d3c7;background:#fff;padding:1rem 1.5rem;display:flex;align-items:center;gap:.5rem;font-weight:600;font-size:1.125rem">
<svg viewBox="0 0 32 32" width="28" height="28" aria-hidden="true"><circle cx="16" cy="16" r="13" fill="none" stroke="#16565d" stroke-width="3"/><path d="M16 7c3 4 5 6.5 5 10a5 5 0 0 1-10 0c0-2 1-3.5 2.2-4.6.2 1.7 1 2.6 2 2.9C15 12.8 15 10 16 7Z" fill="#b4562b"/></svg>
Dutywise</header>
<main style="max-width:36rem;margin:4rem auto;padding:0 1.5rem">
<h1 style="font-size:1.5rem;margin:0 0 1rem">Dutywise is temporarily unavailable</h1>
<p style="line-height:1.5">The desk cannot reach its database at the moment. <strong>Nothing you saved was lost</strong>: sizings, quotes and issued datasheets are kept by the database and will be there when it answers again.</p>
<p style="line-height:1.5;color:#3b4653">Try again in a minute: pages answer normally again as soon as the database is back. A sizing desk that is already open keeps calculating, but cannot save until then.</p>
<p style="margin-top:2rem"><a href="" style="display:inline-block;background:#16565d;color:#fff;border-radius:.375rem;padding:.5rem 1rem;text-decoration:none">Try again</a></p>
</main></body></html>`;

/** The 503 page for a browser. */
export function unavailablePage(): Response {
  return new Response(page, { status: 503, headers: { ...headers, 'content-type': 'text/html; charset=utf-8' } });
}

/** The 503 body for the API, in the `{ errors: [...] }` shape every handler answers with. */
export function unavailableJson(): Response {
  return Response.json({ errors: [{ path: '', message: UNAVAILABLE_MESSAGE }] }, { status: 503, headers });
}
