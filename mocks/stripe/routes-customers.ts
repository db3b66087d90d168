import type { FakeContext } from './context';
import { createCustomer } from './checkout-actions';
import { json, type Route, route } from './http-util';
import { requireCustomer, withExpand } from './lookup';
import {
  assertKnownParams,
  expandParam,
  mergeMetadata,
  optionalEmail,
  optionalMetadata,
  optionalString,
} from './params';
import { renderCustomer } from './render-checkout';

// Accepted so the app may send them; the fake has no use for them.
const IGNORED = ['address', 'preferred_locales', 'shipping', 'tax_exempt'];
const WRITABLE = ['email', 'name', 'description', 'phone', 'metadata', 'expand', ...IGNORED];

export function customerRoutes(ctx: FakeContext): Route[] {
  return [
    route('POST', '/v1/customers', ({ body }) => {
      assertKnownParams(body, WRITABLE);
      const customer = createCustomer(ctx, {
        email: optionalEmail(body, 'email') ?? null,
        name: optionalString(body, 'name', 256) ?? null,
        description: optionalString(body, 'description', 350) ?? null,
        phone: optionalString(body, 'phone', 20) ?? null,
        metadata: optionalMetadata(body, 'metadata') ?? {},
      });
      ctx.store.save();
      return json(withExpand(ctx, renderCustomer(customer), expandParam(body)));
    }),
    route('GET', '/v1/customers/:id', ({ params, body }) => {
      assertKnownParams(body, ['expand']);
      const customer = requireCustomer(ctx, params[0] ?? '');
      return json(withExpand(ctx, renderCustomer(customer), expandParam(body)));
    }),
    route('POST', '/v1/customers/:id', ({ params, body }) => {
      assertKnownParams(body, WRITABLE);
      const customer = requireCustomer(ctx, params[0] ?? '');
      const email = optionalEmail(body, 'email');
      const name = optionalString(body, 'name', 256);
      const description = optionalString(body, 'description', 350);
      const phone = optionalString(body, 'phone', 20);
      const metadata = optionalMetadata(body, 'metadata');
      if (email !== undefined) customer.email = email;
      if (name !== undefined) customer.name = name;
      if (description !== undefined) customer.description = description;
      if (phone !== undefined) customer.phone = phone;
      if (metadata !== undefined) customer.metadata = mergeMetadata(customer.metadata, metadata);
      ctx.store.save();
      return json(withExpand(ctx, renderCustomer(customer), expandParam(body)));
    }),
  ];
}
