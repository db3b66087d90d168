import type Stripe from 'stripe';
import type { BillingInterval } from './periods';
import type { WireShape } from './wire-types';

/** One recurring price the fake sells, with the product it belongs to. */
export type PriceSeed = {
  id: string;
  lookupKey?: string;
  nickname: string;
  productId: string;
  productName: string;
  productDescription?: string;
  /** Amount in the currency's minor unit (cents), as Stripe's unit_amount. */
  unitAmountMinor: number;
  /** ISO 4217, lower case as Stripe returns it. */
  currency: string;
  interval: BillingInterval;
  intervalCount?: number;
};

/** Dutywise's two plans; amounts are the product's own list prices (invented for the demo). */
export const defaultPrices: readonly PriceSeed[] = [
  {
    id: 'price_desk_monthly',
    lookupKey: 'desk_monthly',
    nickname: 'Desk monthly',
    productId: 'prod_desk_monthly',
    productName: 'Dutywise Desk, month by month',
    productDescription: 'Issued PDF datasheets for every sizing in the account, billed monthly.',
    unitAmountMinor: 29_000,
    currency: 'eur',
    interval: 'month',
  },
  {
    id: 'price_desk_annual',
    lookupKey: 'desk_annual',
    nickname: 'Desk annual',
    productId: 'prod_desk_annual',
    productName: 'Dutywise Desk, full year',
    productDescription: 'Issued PDF datasheets for every sizing in the account, billed yearly.',
    unitAmountMinor: 290_000,
    currency: 'eur',
    interval: 'year',
  },
];

export type WirePrice = Omit<WireShape<Stripe.Price>, 'unit_amount_decimal'> & { unit_amount_decimal: string };

/** The price list the fake serves, validated once at start-up. */
export class Catalogue {
  private readonly prices = new Map<string, PriceSeed>();

  constructor(
    seeds: readonly PriceSeed[],
    private readonly createdSeconds: number,
  ) {
    for (const seed of seeds) {
      if (this.prices.has(seed.id)) throw new Error(`Price catalogue: duplicate price id ${seed.id}`);
      if (!Number.isInteger(seed.unitAmountMinor) || seed.unitAmountMinor < 0) {
        throw new Error(`Price catalogue: ${seed.id} unitAmountMinor must be a non-negative integer`);
      }
      if (!/^[a-z]{3}$/.test(seed.currency))
        throw new Error(`Price catalogue: ${seed.id} currency must be 3 lower-case letters`);
      this.prices.set(seed.id, seed);
    }
  }

  find(id: string): PriceSeed | undefined {
    return this.prices.get(id);
  }

  renderPrice(seed: PriceSeed): WirePrice {
    return {
      id: seed.id,
      object: 'price',
      active: true,
      billing_scheme: 'per_unit',
      created: this.createdSeconds,
      currency: seed.currency,
      custom_unit_amount: null,
      livemode: false,
      lookup_key: seed.lookupKey ?? null,
      metadata: {},
      nickname: seed.nickname,
      product: seed.productId,
      recurring: {
        interval: seed.interval,
        interval_count: seed.intervalCount ?? 1,
        meter: null,
        trial_period_days: null,
        usage_type: 'licensed',
      },
      tax_behavior: 'unspecified',
      tiers_mode: null,
      transform_quantity: null,
      type: 'recurring',
      unit_amount: seed.unitAmountMinor,
      unit_amount_decimal: String(seed.unitAmountMinor),
    };
  }

  /** The legacy `plan` twin of a price, which subscription items still carry. */
  renderPlan(seed: PriceSeed): WireShape<Stripe.Plan> {
    return {
      id: seed.id,
      object: 'plan',
      active: true,
      amount: seed.unitAmountMinor,
      billing_scheme: 'per_unit',
      created: this.createdSeconds,
      currency: seed.currency,
      interval: seed.interval,
      interval_count: seed.intervalCount ?? 1,
      livemode: false,
      metadata: {},
      meter: null,
      nickname: seed.nickname,
      product: seed.productId,
      tiers_mode: null,
      transform_usage: null,
      trial_period_days: null,
      usage_type: 'licensed',
    };
  }
}
