import Stripe from 'stripe';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { createDeskCheckout, type Harness, startHarness } from './stripe-harness';

let h: Harness;
beforeEach(async () => {
  h = await startHarness();
});
afterEach(async () => {
  await h.close();
});

/** The SDK error a call rejects with, so each test can check type, status, param and code. */
async function sdkError(call: Promise<unknown>): Promise<Stripe.errors.StripeError> {
  try {
    await call;
  } catch (error) {
    if (error instanceof Stripe.errors.StripeError) return error;
    throw error;
  }
  throw new Error('expected the call to fail');
}

describe('customers', () => {
  it('creates and checks out an existing customer', async () => {
    const customer = await h.stripe.customers.create({
      email: 'ops@harrow-gas.example',
      name: 'Harrow Gas Works',
      metadata: { accountId: 'acct_91' },
    });
    expect(customer.id).toMatch(/^cus_/);
    expect(customer).toMatchObject({
      id: customer.id,
      email: 'ops@harrow-gas.example',
      metadata: { accountId: 'acct_91' },
    });
    const session = await createDeskCheckout(h.stripe, 'price_desk_monthly', {
      customer: customer.id,
      customer_email: undefined,
    });
    expect(session.customer).toBe(customer.id);
    const page = await (await fetch(session.url ?? '')).text();
    expect(page).toContain('value="ops@harrow-gas.example"');
  });

  it('refuses a malformed email', async () => {
    const error = await sdkError(h.stripe.customers.create({ email: 'nobody' }));
    expect(error.statusCode).toBe(400);
    expect(error.param).toBe('email');
  });
});

describe('bad requests get Stripe-style errors', () => {
  it('names the unknown price in line_items', async () => {
    const error = await sdkError(createDeskCheckout(h.stripe, 'price_nope'));
    expect(error).toBeInstanceOf(Stripe.errors.StripeInvalidRequestError);
    expect(error.statusCode).toBe(400);
    expect(error.param).toBe('line_items[0][price]');
    expect(error.code).toBe('resource_missing');
    expect(error.message).toBe("No such price: 'price_nope'");
  });

  it.each([
    ['mode other than subscription', { mode: 'payment' as const }, 'mode'],
    ['both customer and customer_email', { customer: 'cus_x' }, 'customer_email'],
    ['missing success_url', { success_url: undefined }, 'success_url'],
    ['zero quantity', { line_items: [{ price: 'price_desk_monthly', quantity: 0 }] }, 'line_items[0][quantity]'],
    ['empty line items', { line_items: [] }, 'line_items'],
    ['relative cancel_url', { cancel_url: '/pricing' }, 'cancel_url'],
  ])('refuses %s', async (_label, extra, param) => {
    const error = await sdkError(
      createDeskCheckout(h.stripe, 'price_desk_monthly', extra as Partial<Stripe.Checkout.SessionCreateParams>),
    );
    expect(error.statusCode).toBe(400);
    expect(error.type).toBe('StripeInvalidRequestError');
    expect(error.param).toBe(param);
  });

  it('refuses metadata keys longer than 40 characters [mem: Stripe metadata limits]', async () => {
    const error = await sdkError(
      createDeskCheckout(h.stripe, 'price_desk_monthly', { metadata: { ['k'.repeat(41)]: 'v' } }),
    );
    expect(error.statusCode).toBe(400);
    expect(error.message).toContain('at most 40 characters');
  });

  it('refuses unknown parameters by name', async () => {
    const error = await sdkError(h.stripe.customers.create({ colour: 'teal' } as Stripe.CustomerCreateParams));
    expect(error.statusCode).toBe(400);
    expect(error.message).toBe('Received unknown parameter: colour');
  });

  it('answers 404 resource_missing for unknown ids', async () => {
    const error = await sdkError(h.stripe.subscriptions.retrieve('sub_missing'));
    expect(error.statusCode).toBe(404);
    expect(error.code).toBe('resource_missing');
    expect(error.message).toBe("No such subscription: 'sub_missing'");
  });

  it('answers unknown routes with a 404 error body', async () => {
    const response = await fetch(`${h.fake.url}/v1/payouts`, { headers: { authorization: 'Bearer sk_test_local' } });
    expect(response.status).toBe(404);
    const body = (await response.json()) as { error: { type: string; message: string } };
    expect(body.error.type).toBe('invalid_request_error');
    expect(body.error.message).toContain('/v1/payouts');
  });

  it('requires a test API key', async () => {
    const anonymous = await fetch(`${h.fake.url}/v1/subscriptions/sub_any`);
    expect(anonymous.status).toBe(401);
    const live = await fetch(`${h.fake.url}/v1/subscriptions/sub_any`, {
      headers: { authorization: 'Bearer sk_live_abc' },
    });
    expect(live.status).toBe(401);
    expect(((await live.json()) as { error: { message: string } }).error.message).toContain('live keys');
  });

  it('refuses a malformed form body with 400', async () => {
    const response = await fetch(`${h.fake.url}/v1/customers`, {
      method: 'POST',
      headers: { authorization: 'Bearer sk_test_local', 'content-type': 'application/x-www-form-urlencoded' },
      body: 'metadata=x&metadata[a]=y',
    });
    expect(response.status).toBe(400);
    expect(((await response.json()) as { error: { type: string } }).error.type).toBe('invalid_request_error');
  });
});
