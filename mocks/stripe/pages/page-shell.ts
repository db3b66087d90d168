const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

/** Escapes text for HTML content and attribute values. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"']/g, (ch) => ESCAPES[ch] ?? ch);
}

/** "€290.00" style amounts from minor units. */
export function formatMoney(minor: number, currency: string): string {
  return new Intl.NumberFormat('en-GB', { style: 'currency', currency: currency.toUpperCase() }).format(minor / 100);
}

/** A date as YYYY-MM-DD (UTC), unambiguous for readers anywhere. */
export function formatDate(seconds: number): string {
  return new Date(seconds * 1000).toISOString().slice(0, 10);
}

const STYLE = `
  :root { color-scheme: light; --ink: #1d2430; --muted: #5b6472; --line: #d5d9e0; --panel: #ffffff; --ground: #eef0f3; --warn: #8a5a00; --warn-bg: #fff6df; --bad: #a32020; --bad-bg: #fdecec; --ok: #1f6b3a; }
  * { box-sizing: border-box; }
  body { margin: 0; font: 15px/1.5 "IBM Plex Sans", system-ui, sans-serif; color: var(--ink); background: var(--ground); }
  .test-band { background: repeating-linear-gradient(135deg, #ffe08a 0 14px, #fff1c4 14px 28px); border-bottom: 2px solid var(--warn); padding: 10px 16px; text-align: center; font-weight: 600; letter-spacing: .02em; }
  main { max-width: 560px; margin: 28px auto; padding: 0 16px; }
  .panel { background: var(--panel); border: 1px solid var(--line); border-radius: 6px; padding: 20px 22px; margin-bottom: 16px; }
  h1 { font-size: 20px; margin: 0 0 4px; } h2 { font-size: 16px; margin: 0 0 8px; }
  .muted { color: var(--muted); font-size: 13px; }
  table { width: 100%; border-collapse: collapse; } td, th { text-align: left; padding: 6px 0; border-bottom: 1px solid var(--line); vertical-align: top; }
  td.num, th.num { text-align: right; font-variant-numeric: tabular-nums; }
  label { display: block; font-weight: 500; margin: 12px 0 4px; }
  input { width: 100%; padding: 8px 10px; font: inherit; border: 1px solid #aab1bc; border-radius: 4px; }
  input[aria-invalid="true"] { border-color: var(--bad); }
  .row { display: flex; gap: 12px; } .row > div { flex: 1; }
  .field-error { color: var(--bad); font-size: 13px; margin-top: 2px; }
  .alert { background: var(--bad-bg); color: var(--bad); border: 1px solid #f0b8b8; border-radius: 4px; padding: 10px 12px; margin-bottom: 12px; font-weight: 500; }
  .notice { background: #e9f5ec; color: var(--ok); border: 1px solid #b9dcc4; border-radius: 4px; padding: 10px 12px; margin-bottom: 12px; }
  .hint { background: var(--warn-bg); border: 1px dashed var(--warn); border-radius: 4px; padding: 10px 12px; font-size: 13px; }
  button { font: inherit; font-weight: 600; padding: 9px 16px; border-radius: 4px; border: 1px solid #27405f; background: #27405f; color: #fff; cursor: pointer; }
  button.secondary { background: #fff; color: #27405f; }
  .actions { display: flex; gap: 10px; align-items: center; margin-top: 16px; flex-wrap: wrap; }
  a { color: #27405f; }
`;

/** The frame every fake page shares, with a band no one can mistake for a real payment page. */
export function pageShell(title: string, body: string): string {
  return `<!doctype html>
<html lang="en">
<head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<meta name="robots" content="noindex"><title>${escapeHtml(title)} · local test</title><style>${STYLE}</style></head>
<body>
<div class="test-band">LOCAL TEST PAYMENT PAGE · Dutywise development fake · no real money moves · never enter a real card</div>
<main>${body}</main>
</body>
</html>`;
}

/** A one-panel page for expired, finished or missing sessions. */
export function messagePage(title: string, message: string, link?: { href: string; label: string }): string {
  const action = link
    ? `<div class="actions"><a href="${escapeHtml(link.href)}">${escapeHtml(link.label)}</a></div>`
    : '';
  return pageShell(
    title,
    `<section class="panel"><h1>${escapeHtml(title)}</h1><p>${escapeHtml(message)}</p>${action}</section>`,
  );
}
