import type Stripe from 'stripe';
import type { RenderContext } from './render-context';
import type { CustomerRecord, PortalSessionRecord, SessionRecord } from './records';
import type { WireShape } from './wire-types';

export function renderCustomer(customer: CustomerRecord): WireShape<Stripe.Customer> {
  return {
    id: customer.id,
    object: 'customer',
    address: null,
    balance: 0,
    created: customer.created,
    currency: null,
    default_source: null,
    delinquent: false,
    description: customer.description,
    email: customer.email,
    invoice_prefix: customer.id.slice(4, 12).toUpperCase(),
    invoice_settings: { custom_fields: null, default_payment_method: null, footer: null, rendering_options: null },
    livemode: false,
    metadata: customer.metadata,
    name: customer.name,
    phone: customer.phone,
    preferred_locales: [],
    shipping: null,
    tax_exempt: 'none',
    test_clock: null,
  };
}

export function checkoutPageUrl(ctx: RenderContext, sessionId: string): string {
  return `${ctx.publicBaseUrl}/pay/${sessionId}`;
}

export function renderSession(ctx: RenderContext, session: SessionRecord): WireShape<Stripe.Checkout.Session> {
  const details = session.customerDetails;
  return {
    id: session.id,
    object: 'checkout.session',
    after_expiration: null,
    allow_promotion_codes: null,
    amount_subtotal: session.amountTotalMinor,
    amount_total: session.amountTotalMinor,
    automatic_tax: { enabled: false, liability: null, provider: null, status: null },
    billing_address_collection: null,
    cancel_url: session.cancelUrl,
    client_reference_id: session.clientReferenceId,
    client_secret: null,
    consent: null,
    consent_collection: null,
    created: session.created,
    currency: session.currency,
    custom_fields: [],
    custom_text: { after_submit: null, shipping_address: null, submit: null, terms_of_service_acceptance: null },
    customer: session.customerId,
    customer_creation: session.customerId ? null : 'always',
    customer_details: details
      ? { address: null, email: details.email, name: details.name, phone: null, tax_exempt: 'none', tax_ids: [] }
      : null,
    customer_email: session.customerEmail,
    expires_at: session.expiresAt,
    invoice: session.invoiceId,
    invoice_creation: null,
    livemode: false,
    locale: null,
    metadata: session.metadata,
    mode: 'subscription',
    payment_intent: null,
    payment_link: null,
    payment_method_collection: 'always',
    payment_method_types: ['card'],
    payment_status: session.paymentStatus,
    recovered_from: null,
    saved_payment_method_options: null,
    setup_intent: null,
    shipping_address_collection: null,
    shipping_cost: null,
    shipping_options: [],
    status: session.status,
    submit_type: null,
    subscription: session.subscriptionId,
    success_url: session.successUrl,
    total_details: { amount_discount: 0, amount_shipping: 0, amount_tax: 0 },
    ui_mode: 'hosted',
    // Stripe only gives the page address while the session can still be paid.
    url: session.status === 'open' ? checkoutPageUrl(ctx, session.id) : null,
  };
}

export function renderPortalSession(
  ctx: RenderContext,
  portal: PortalSessionRecord,
): WireShape<Stripe.BillingPortal.Session> {
  return {
    id: portal.id,
    object: 'billing_portal.session',
    configuration: 'bpc_dutywise_local',
    created: portal.created,
    customer: portal.customerId,
    customer_account: null,
    flow: null,
    livemode: false,
    locale: null,
    on_behalf_of: null,
    return_url: portal.returnUrl,
    url: `${ctx.publicBaseUrl}/manage/${portal.id}`,
  };
}
