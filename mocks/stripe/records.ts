import type { JsonObject } from './wire-types';

// Internal records: what the fake remembers. Renderers turn them into Stripe-shaped JSON.

export type CustomerRecord = {
  id: string;
  created: number;
  email: string | null;
  name: string | null;
  description: string | null;
  phone: string | null;
  metadata: Record<string, string>;
};

export type LineItemRecord = { id: string; priceId: string; quantity: number };

export type SessionRecord = {
  id: string;
  created: number;
  expiresAt: number;
  status: 'open' | 'complete' | 'expired';
  paymentStatus: 'unpaid' | 'paid' | 'no_payment_required';
  customerId: string | null;
  customerEmail: string | null;
  customerDetails: { email: string; name: string } | null;
  clientReferenceId: string | null;
  metadata: Record<string, string>;
  subscriptionMetadata: Record<string, string>;
  lineItems: LineItemRecord[];
  currency: string;
  amountTotalMinor: number;
  successUrl: string;
  cancelUrl: string | null;
  subscriptionId: string | null;
  invoiceId: string | null;
};

export type SubscriptionItemRecord = { id: string; created: number; priceId: string; quantity: number };

export type SubscriptionStatus = 'active' | 'past_due' | 'canceled';

export type SubscriptionRecord = {
  id: string;
  created: number;
  customerId: string;
  status: SubscriptionStatus;
  items: SubscriptionItemRecord[];
  metadata: Record<string, string>;
  currency: string;
  startDate: number;
  billingCycleAnchor: number;
  currentPeriodStart: number;
  currentPeriodEnd: number;
  cancelAtPeriodEnd: boolean;
  cancelAt: number | null;
  canceledAt: number | null;
  endedAt: number | null;
  latestInvoiceId: string | null;
};

export type InvoiceLineRecord = {
  id: string;
  priceId: string;
  quantity: number;
  amountMinor: number;
  periodStart: number;
  periodEnd: number;
  subscriptionItemId: string;
};

export type InvoiceRecord = {
  id: string;
  number: string;
  created: number;
  customerId: string;
  subscriptionId: string;
  status: 'paid' | 'open';
  billingReason: 'subscription_create' | 'subscription_cycle';
  currency: string;
  totalMinor: number;
  attemptCount: number;
  periodStart: number;
  periodEnd: number;
  paidAt: number | null;
  lines: InvoiceLineRecord[];
};

export type PortalSessionRecord = { id: string; created: number; customerId: string; returnUrl: string | null };

export type DeliveryRecord = {
  status: 'pending' | 'delivered' | 'failed';
  attempts: number;
  lastStatusCode: number | null;
  lastError: string | null;
  lastAttemptAt: number | null;
  deliveredAt: number | null;
};

export type EventRecord = {
  id: string;
  type: string;
  created: number;
  apiVersion: string;
  object: JsonObject;
  previousAttributes: JsonObject | null;
  delivery: DeliveryRecord;
};

export type FakeState = {
  version: 1;
  invoiceCounter: number;
  customers: Record<string, CustomerRecord>;
  sessions: Record<string, SessionRecord>;
  subscriptions: Record<string, SubscriptionRecord>;
  invoices: Record<string, InvoiceRecord>;
  portalSessions: Record<string, PortalSessionRecord>;
  events: EventRecord[];
};

export function emptyState(): FakeState {
  return {
    version: 1,
    invoiceCounter: 0,
    customers: {},
    sessions: {},
    subscriptions: {},
    invoices: {},
    portalSessions: {},
    events: [],
  };
}
