import { escapeHtml, formatDate, pageShell } from './page-shell';

export type PortalRow = {
  id: string;
  plan: string;
  priceLabel: string;
  status: string;
  periodEnd: number;
  cancelAtPeriodEnd: boolean;
  endedAt: number | null;
};

export type PortalPageModel = {
  portalId: string;
  customerLabel: string;
  rows: PortalRow[];
  returnUrl: string | null;
  notice: string | null;
};

const STATUS_LABELS: Record<string, string> = {
  active: 'Active',
  past_due: 'Payment overdue',
  canceled: 'Ended',
};

function renewalText(row: PortalRow): string {
  if (row.status === 'canceled') return `Ended ${formatDate(row.endedAt ?? row.periodEnd)}`;
  if (row.cancelAtPeriodEnd) return `Ends ${formatDate(row.periodEnd)}; it will not renew`;
  return `Renews ${formatDate(row.periodEnd)}`;
}

function actions(portalId: string, row: PortalRow): string {
  if (row.status === 'canceled') return '';
  const base = `/manage/${escapeHtml(portalId)}/subscriptions/${escapeHtml(row.id)}`;
  return row.cancelAtPeriodEnd
    ? `<form method="post" action="${base}/resume"><button type="submit">Resume</button></form>`
    : `<form method="post" action="${base}/cancel"><button type="submit" class="secondary">Cancel at period end</button></form>`;
}

/** The fake's own subscription management page. */
export function renderPortalPage(model: PortalPageModel): string {
  const notice = model.notice ? `<div class="notice" role="status">${escapeHtml(model.notice)}</div>` : '';
  const rows = model.rows.length
    ? model.rows
        .map(
          (row) => `<section class="panel" data-subscription="${escapeHtml(row.id)}">
  <h2>${escapeHtml(row.plan)}</h2>
  <table><tbody>
    <tr><th>Plan</th><td>${escapeHtml(row.plan)} · ${escapeHtml(row.priceLabel)}</td></tr>
    <tr><th>Status</th><td>${escapeHtml(STATUS_LABELS[row.status] ?? row.status)}</td></tr>
    <tr><th>Period end</th><td>${escapeHtml(renewalText(row))}</td></tr>
  </tbody></table>
  <div class="actions">${actions(model.portalId, row)}</div>
</section>`,
        )
        .join('')
    : '<section class="panel"><p>No subscriptions on this customer yet.</p></section>';
  const back = model.returnUrl ? `<p><a href="${escapeHtml(model.returnUrl)}">Back to Dutywise</a></p>` : '';
  return pageShell(
    'Manage subscription',
    `<section class="panel"><h1>Manage subscription</h1><p class="muted">${escapeHtml(model.customerLabel)}</p>${back}</section>${notice}${rows}`,
  );
}
