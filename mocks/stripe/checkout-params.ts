import { badParam, noSuchParam } from './api-error';
import type { PriceSeed } from './catalogue';
import type { FakeContext } from './context';
import type { FormObject } from './form-body';
import { newId } from './ids';
import type { LineItemRecord } from './records';
import {
  assertKnownParams,
  optionalEmail,
  optionalHash,
  optionalInteger,
  optionalList,
  optionalMetadata,
  optionalString,
  optionalUrl,
  requiredString,
} from './params';

const KNOWN = [
  'mode',
  'line_items',
  'customer',
  'customer_email',
  'client_reference_id',
  'metadata',
  'subscription_data',
  'success_url',
  'cancel_url',
];
// Stripe's limits: a session is payable for 24 hours, 200 characters of client_reference_id,
// quantities up to 999,999 [mem].
const EXPIRY_SECONDS = 24 * 60 * 60;

export type CheckoutParams = {
  customerId: string | null;
  customerEmail: string | null;
  clientReferenceId: string | null;
  metadata: Record<string, string>;
  subscriptionMetadata: Record<string, string>;
  lineItems: LineItemRecord[];
  seeds: PriceSeed[];
  successUrl: string;
  cancelUrl: string | null;
  expiresAt: number;
};

function readLineItems(ctx: FakeContext, body: FormObject): { items: LineItemRecord[]; seeds: PriceSeed[] } {
  const raw = optionalList(body, 'line_items');
  if (raw.length === 0)
    throw badParam(
      'line_items',
      'Missing required param: line_items (at least one, e.g. line_items[0][price]).',
      'parameter_missing',
    );
  const items: LineItemRecord[] = [];
  const seeds: PriceSeed[] = [];
  raw.forEach((entry, i) => {
    const param = `line_items[${i}]`;
    if (typeof entry !== 'object' || Array.isArray(entry)) throw badParam(param, `Invalid ${param}: must be a hash.`);
    if (entry.price_data !== undefined)
      throw badParam(
        `${param}[price_data]`,
        'The local Stripe fake sells only catalogue prices; pass line_items[n][price].',
      );
    assertKnownParams(entry, ['price', 'quantity'], param);
    const priceId = requiredString(entry, 'price', 200, `${param}[price]`);
    const seed = ctx.catalogue.find(priceId);
    if (!seed) throw noSuchParam('price', priceId, `${param}[price]`);
    const quantity = optionalInteger(entry, 'quantity', 1, 999_999, `${param}[quantity]`) ?? 1;
    items.push({ id: newId('li'), priceId, quantity });
    seeds.push(seed);
  });
  const [first] = seeds;
  if (
    first &&
    seeds.some((s) => s.interval !== first.interval || (s.intervalCount ?? 1) !== (first.intervalCount ?? 1))
  ) {
    throw badParam('line_items', 'All line items of a subscription checkout must bill on the same interval.');
  }
  if (first && seeds.some((s) => s.currency !== first.currency))
    throw badParam('line_items', 'All line items must share one currency.');
  return { items, seeds };
}

/** Validates a checkout session request the way Stripe would, with the field named in every error. */
export function readCheckoutParams(ctx: FakeContext, body: FormObject, nowSeconds: number): CheckoutParams {
  assertKnownParams(body, KNOWN);
  const mode = requiredString(body, 'mode', 20);
  if (mode !== 'subscription')
    throw badParam('mode', `The local Stripe fake supports only mode=subscription, got '${mode}'.`);
  const customerId = optionalString(body, 'customer', 200) || null;
  const customerEmail = optionalEmail(body, 'customer_email') ?? null;
  if (customerId && customerEmail)
    throw badParam('customer_email', 'You may only specify one of these parameters: customer, customer_email.');
  if (customerId && !ctx.store.state.customers[customerId]) throw noSuchParam('customer', customerId, 'customer');
  const successUrl = optionalUrl(body, 'success_url');
  if (!successUrl)
    throw badParam(
      'success_url',
      'Missing required param: success_url (the page Checkout returns to after payment).',
      'parameter_missing',
    );
  const subscriptionData = optionalHash(body, 'subscription_data') ?? {};
  assertKnownParams(subscriptionData, ['metadata'], 'subscription_data');
  const { items, seeds } = readLineItems(ctx, body);
  return {
    customerId,
    customerEmail,
    clientReferenceId: optionalString(body, 'client_reference_id', 200) ?? null,
    metadata: optionalMetadata(body, 'metadata') ?? {},
    subscriptionMetadata: optionalMetadata(subscriptionData, 'metadata', 'subscription_data[metadata]') ?? {},
    lineItems: items,
    seeds,
    successUrl,
    cancelUrl: optionalUrl(body, 'cancel_url') ?? null,
    expiresAt: nowSeconds + EXPIRY_SECONDS,
  };
}
