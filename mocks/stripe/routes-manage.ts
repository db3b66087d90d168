import { noSuch } from './api-error';
import type { FakeContext } from './context';
import { html, redirect, type Route, route } from './http-util';
import { requireSubscription } from './lookup';
import { formatMoney } from './pages/page-shell';
import { type PortalRow, renderPortalPage } from './pages/portal-page';
import type { PortalSessionRecord } from './records';
import { requirePrice } from './render-context';
import { updateSubscription } from './subscription-actions';

const NOTICES: Record<string, string> = {
  'cancel-scheduled': 'Your subscription will end at the close of the current period.',
  resumed: 'Your subscription will renew as usual.',
};

function requirePortal(ctx: FakeContext, id: string): PortalSessionRecord {
  const portal = ctx.store.state.portalSessions[id];
  if (!portal) throw noSuch('billing_portal.session', id);
  return portal;
}

function rows(ctx: FakeContext, customerId: string): PortalRow[] {
  return Object.values(ctx.store.state.subscriptions)
    .filter((sub) => sub.customerId === customerId)
    .sort((a, b) => b.created - a.created)
    .map((sub) => {
      const seed = requirePrice(ctx, sub.items[0]?.priceId ?? '');
      return {
        id: sub.id,
        plan: seed.nickname,
        priceLabel: `${formatMoney(seed.unitAmountMinor, seed.currency)} per ${seed.interval}`,
        status: sub.status,
        periodEnd: sub.currentPeriodEnd,
        cancelAtPeriodEnd: sub.cancelAtPeriodEnd,
        endedAt: sub.endedAt,
      };
    });
}

/** Changes a subscription that must belong to the portal session's customer. */
function portalChange(ctx: FakeContext, portalId: string, subId: string, cancel: boolean) {
  const portal = requirePortal(ctx, portalId);
  const sub = requireSubscription(ctx, subId);
  if (sub.customerId !== portal.customerId) throw noSuch('subscription', subId);
  updateSubscription(ctx, sub, { cancelAtPeriodEnd: cancel });
  return redirect(`/manage/${portal.id}?notice=${cancel ? 'cancel-scheduled' : 'resumed'}`);
}

export function manageRoutes(ctx: FakeContext): Route[] {
  return [
    route('GET', '/manage/:id', ({ params, url }) => {
      const portal = requirePortal(ctx, params[0] ?? '');
      const customer = ctx.store.state.customers[portal.customerId];
      return html(
        renderPortalPage({
          portalId: portal.id,
          customerLabel: customer?.email ?? customer?.name ?? portal.customerId,
          rows: rows(ctx, portal.customerId),
          returnUrl: portal.returnUrl,
          notice: NOTICES[url.searchParams.get('notice') ?? ''] ?? null,
        }),
      );
    }),
    route('POST', '/manage/:id/subscriptions/:sub/cancel', ({ params }) =>
      portalChange(ctx, params[0] ?? '', params[1] ?? '', true),
    ),
    route('POST', '/manage/:id/subscriptions/:sub/resume', ({ params }) =>
      portalChange(ctx, params[0] ?? '', params[1] ?? '', false),
    ),
  ];
}
