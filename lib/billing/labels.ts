import type { Entitlement } from './entitlements';

// Client-safe: Dutywise's own words for a subscription's state, shown on the accounts list, an account's page
// and the subscription page alike. The payment provider's status codes never reach the screen.

export type SubscriptionState = Entitlement['reason'];

export const subscriptionLabels: Readonly<Record<SubscriptionState, string>> = {
  active: 'Active',
  grace: 'Payment failed',
  'period-remaining': 'Cancelled at period end',
  none: 'No subscription',
  lapsed: 'Ended',
};

export const subscriptionTone: Readonly<Record<SubscriptionState, 'good' | 'caution' | 'info' | 'neutral'>> = {
  active: 'good',
  grace: 'caution',
  'period-remaining': 'info',
  none: 'neutral',
  lapsed: 'neutral',
};

/** The payment provider's subscription statuses in Dutywise's words, for the audit trail. */
export const providerStatusWords: Readonly<Record<string, string>> = {
  active: 'Active',
  trialing: 'Active (trial)',
  past_due: 'Payment failed',
  unpaid: 'Ended (unpaid)',
  canceled: 'Ended',
  incomplete: 'Awaiting first payment',
  incomplete_expired: 'First payment not made',
  paused: 'Paused',
};
