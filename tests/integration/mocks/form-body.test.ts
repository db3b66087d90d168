import { describe, expect, it } from 'vitest';
import { FormParseError, parseForm } from '@/mocks/stripe/form-body';

// The key syntax is the one stripe-node's request encoder writes (`a[b][0][c]=v`), read from
// node_modules/stripe/esm/utils.js (stringifyRequestData).
describe('parseForm', () => {
  it('builds nested hashes and indexed arrays', () => {
    const body = parseForm(
      'mode=subscription&line_items[0][price]=price_desk_monthly&line_items[0][quantity]=2&line_items[1][price]=p2' +
        '&metadata[accountId]=acct_1&subscription_data[metadata][x]=y&expand[0]=subscription',
    );
    expect(body).toEqual({
      mode: 'subscription',
      line_items: [{ price: 'price_desk_monthly', quantity: '2' }, { price: 'p2' }],
      metadata: { accountId: 'acct_1' },
      subscription_data: { metadata: { x: 'y' } },
      expand: ['subscription'],
    });
  });

  it('decodes percent-encoded brackets and values', () => {
    expect(parseForm('metadata%5Bnote%5D=a%20%26%20b')).toEqual({ metadata: { note: 'a & b' } });
  });

  it('appends for empty brackets', () => {
    expect(parseForm('expand[]=a&expand[]=b')).toEqual({ expand: ['a', 'b'] });
  });

  it.each([
    ['a value and a hash under one key', 'metadata=x&metadata[a]=y'],
    ['a hash then a value', 'metadata[a]=y&metadata=x'],
    ['an array with a gap', 'line_items[0][price]=a&line_items[2][price]=b'],
    ['an unbalanced bracket', 'line_items[0[price]=a'],
  ])('refuses %s', (_label, text) => {
    expect(() => parseForm(text)).toThrow(FormParseError);
  });
});
