import { badParam, noSuch } from './api-error';
import type { FakeContext } from './context';
import { json, type Route, route } from './http-util';
import { listReply } from './list-reply';
import { withExpand } from './lookup';
import { assertKnownParams, expandParam, optionalBoolean, optionalList, optionalString } from './params';

const PRICE_LIST_PARAMS = [
  'active',
  'currency',
  'lookup_keys',
  'product',
  'type',
  'recurring',
  'limit',
  'starting_after',
  'ending_before',
  'expand',
];

export function catalogueRoutes(ctx: FakeContext): Route[] {
  const { catalogue } = ctx;
  return [
    route('GET', '/v1/prices', ({ body }) => {
      assertKnownParams(body, PRICE_LIST_PARAMS);
      const active = optionalBoolean(body, 'active');
      const currency = optionalString(body, 'currency', 3);
      const product = optionalString(body, 'product', 200);
      const type = optionalString(body, 'type', 20);
      const lookupKeys = optionalList(body, 'lookup_keys').map((key, i) => {
        if (typeof key !== 'string')
          throw badParam(`lookup_keys[${i}]`, `Invalid lookup_keys[${i}]: must be a string.`);
        return key;
      });
      const expand = expandParam(body).map((path) => path.replace(/^data\./, ''));
      const prices = catalogue
        .all()
        .filter(() => active !== false)
        .filter((seed) => !currency || seed.currency === currency)
        .filter((seed) => !product || seed.productId === product)
        .filter(() => !type || type === 'recurring')
        .filter(
          (seed) => lookupKeys.length === 0 || (seed.lookupKey !== undefined && lookupKeys.includes(seed.lookupKey)),
        )
        .map((seed) => withExpand(ctx, catalogue.renderPrice(seed), expand));
      return json(listReply(prices, body, '/v1/prices'));
    }),
    route('GET', '/v1/prices/:id', ({ params, body }) => {
      assertKnownParams(body, ['expand']);
      const id = params[0] ?? '';
      const seed = catalogue.find(id);
      if (!seed) throw noSuch('price', id);
      return json(withExpand(ctx, catalogue.renderPrice(seed), expandParam(body)));
    }),
    route('GET', '/v1/products/:id', ({ params, body }) => {
      assertKnownParams(body, ['expand']);
      const id = params[0] ?? '';
      const seed = catalogue.findProduct(id);
      if (!seed) throw noSuch('product', id);
      return json(withExpand(ctx, catalogue.renderProduct(seed), expandParam(body)));
    }),
  ];
}
