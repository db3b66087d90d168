import type { StoredMessage } from './message-store';

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };
const escapeHtml = (text: string) => text.replace(/[&<>"']/g, (ch) => ESCAPES[ch] ?? ch);

/** A plain list of received mail for people checking the demo by hand. */
export function renderInboxPage(messages: StoredMessage[]): string {
  const rows = [...messages]
    .reverse()
    .map(
      (
        m,
      ) => `<tr><td>${escapeHtml(m.receivedAt.replace('T', ' ').slice(0, 19))}</td><td>${escapeHtml(m.from ?? '')}</td>
<td>${escapeHtml(m.to.join(', '))}</td><td><a href="/messages/${m.id}/html">${escapeHtml(m.subject || '(no subject)')}</a></td>
<td><a href="/messages/${m.id}">JSON</a></td></tr>`,
    )
    .join('');
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><title>Local mail · Dutywise development fake</title>
<style>body{font:14px/1.5 "IBM Plex Sans",system-ui,sans-serif;margin:24px;color:#1d2430}table{border-collapse:collapse;width:100%}
td,th{border-bottom:1px solid #d5d9e0;padding:6px 8px;text-align:left;vertical-align:top}.band{background:#fff1c4;border:1px dashed #8a5a00;padding:8px 12px;margin-bottom:16px}</style></head>
<body><div class="band">Local mail fake: messages sent by the app in development and tests. Nothing here left this machine.</div>
<h1>Received mail (${messages.length})</h1>
${messages.length ? `<table><thead><tr><th>Received (UTC)</th><th>From</th><th>To</th><th>Subject</th><th></th></tr></thead><tbody>${rows}</tbody></table>` : '<p>No mail yet.</p>'}
</body></html>`;
}
