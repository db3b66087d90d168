import { badParam } from './api-error';
import type { Catalogue, PriceSeed } from './catalogue';
import type { StateStore } from './state-store';

/** What renderers need to turn records into Stripe-shaped JSON. */
export type RenderContext = {
  catalogue: Catalogue;
  store: StateStore;
  publicBaseUrl: string;
};

/** The catalogue price behind a stored record; a record pointing at a removed price is a configuration fault. */
export function requirePrice(ctx: RenderContext, priceId: string): PriceSeed {
  const seed = ctx.catalogue.find(priceId);
  if (!seed)
    throw badParam(
      'price',
      `Price ${priceId} is no longer in the fake's catalogue (was it removed from the options?).`,
    );
  return seed;
}
