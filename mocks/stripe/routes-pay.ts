import { type CardFormInput, checkCardForm } from './card-form';
import { completeCheckout } from './checkout-actions';
import type { FakeContext } from './context';
import type { FormObject } from './form-body';
import { html, redirect, type Route, route } from './http-util';
import { requireSession } from './lookup';
import { type CheckoutPageModel, renderCheckoutPage } from './pages/checkout-page';
import { messagePage } from './pages/page-shell';
import type { SessionRecord } from './records';
import { requirePrice } from './render-context';

function intervalLabel(interval: string, count: number): string {
  return count === 1 ? `per ${interval}` : `every ${count} ${interval}s`;
}

function pageModel(ctx: FakeContext, session: SessionRecord, values: Partial<CardFormInput>): CheckoutPageModel {
  const customer = session.customerId ? ctx.store.state.customers[session.customerId] : undefined;
  const lockedEmail = session.customerEmail ?? customer?.email ?? null;
  const lines = session.lineItems.map((item) => {
    const seed = requirePrice(ctx, item.priceId);
    return {
      label: `${seed.nickname} (${seed.productName})`,
      quantity: item.quantity,
      amountMinor: seed.unitAmountMinor * item.quantity,
      intervalLabel: intervalLabel(seed.interval, seed.intervalCount ?? 1),
    };
  });
  return {
    sessionId: session.id,
    currency: session.currency,
    totalMinor: session.amountTotalMinor,
    intervalLabel: lines[0]?.intervalLabel ?? '',
    lines,
    values: { ...values, email: lockedEmail ?? values.email ?? '' },
    emailLocked: lockedEmail !== null,
    fieldErrors: {},
    formError: null,
    cancelUrl: session.cancelUrl,
  };
}

/** Pages for sessions that can no longer be paid. */
function closedPage(session: SessionRecord) {
  if (session.status === 'complete') {
    const href = session.successUrl.replaceAll('{CHECKOUT_SESSION_ID}', session.id);
    return html(
      messagePage('Already paid', 'This checkout is complete; the subscription is active.', {
        href,
        label: 'Continue to Dutywise',
      }),
      409,
    );
  }
  const link = session.cancelUrl ? { href: session.cancelUrl, label: 'Back to Dutywise' } : undefined;
  return html(messagePage('Checkout expired', 'This checkout has expired. Start a new one from Dutywise.', link), 410);
}

function formInput(body: FormObject): CardFormInput {
  const text = (key: string) => {
    const value = body[key];
    return typeof value === 'string' ? value : '';
  };
  return {
    email: text('email'),
    cardNumber: text('cardNumber'),
    expiry: text('expiry'),
    cvc: text('cvc'),
    name: text('name'),
  };
}

export function payRoutes(ctx: FakeContext): Route[] {
  return [
    route('GET', '/pay/:id', ({ params }) => {
      const session = requireSession(ctx, params[0] ?? '');
      if (session.status !== 'open') return closedPage(session);
      return html(renderCheckoutPage(pageModel(ctx, session, {})));
    }),
    route('POST', '/pay/:id', async ({ params, body }) => {
      const session = requireSession(ctx, params[0] ?? '');
      if (session.status !== 'open') return closedPage(session);
      const input = formInput(body);
      const model = pageModel(ctx, session, input);
      // Never echo card data back into the page; the customer re-types it, as on a real form.
      model.values = { email: model.values.email, name: input.name, expiry: input.expiry };
      const result = checkCardForm({ ...input, email: model.values.email ?? '' }, new Date());
      if (!result.ok) {
        model.fieldErrors = result.fieldErrors;
        model.formError = 'Check the highlighted fields.';
        return html(renderCheckoutPage(model), 422);
      }
      if (result.outcome === 'declined') {
        model.formError = 'Your card was declined.';
        return html(renderCheckoutPage(model), 402);
      }
      const eventIds = completeCheckout(ctx, session, { email: result.email, name: result.name });
      // Stripe redirects without waiting; waiting briefly for the first delivery attempts lets the
      // success page see the webhook's effect in the demo, while a down app still gets redirected.
      await ctx.sender.waitForAttempts(eventIds, ctx.redirectWaitMs);
      return redirect(session.successUrl.replaceAll('{CHECKOUT_SESSION_ID}', session.id));
    }),
  ];
}
