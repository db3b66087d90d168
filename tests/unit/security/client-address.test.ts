import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { addressKey, clientAddress, parseTrustedProxies, PEER_HEADER } from '@/lib/security/client-address';

const marker = globalThis as { __dutywisePeerHeader?: boolean };
const h = (peer: string, xff?: string) =>
  new Headers({ [PEER_HEADER]: peer, ...(xff ? { 'x-forwarded-for': xff } : {}) });

describe('the client address under lib/server/serve.mjs', () => {
  beforeEach(() => void (marker.__dutywisePeerHeader = true));
  afterEach(() => void delete marker.__dutywisePeerHeader);

  it('with no trusted proxy it is the socket address, whatever X-Forwarded-For says', () => {
    const none = parseTrustedProxies('');
    expect(clientAddress(h('198.51.100.7', '203.0.113.1'), none)).toBe('198.51.100.7');
    expect(clientAddress(h('::ffff:198.51.100.7'), none)).toBe('198.51.100.7');
  });

  it('behind trusted proxies it is the right-most hop that is not one of them', () => {
    const proxies = parseTrustedProxies('10.0.0.0/8, 192.0.2.10');
    // client spoofs 1.1.1.1; the edge proxy (192.0.2.10) appended the real client; the inner proxy is 10.1.2.3
    expect(clientAddress(h('10.1.2.3', '1.1.1.1, 203.0.113.50, 192.0.2.10'), proxies)).toBe('203.0.113.50');
    // a request reaching the app directly, not through a proxy, is the socket address
    expect(clientAddress(h('203.0.113.99', '1.1.1.1'), proxies)).toBe('203.0.113.99');
  });

  it('counts IPv6 clients per /64', () => {
    expect(addressKey('2001:db8:aa:bb:1:2:3:4')).toBe('2001:db8:aa:bb::/64');
    expect(addressKey('2001:db8::1')).toBe('2001:db8:0:0::/64');
    expect(addressKey('198.51.100.7')).toBe('198.51.100.7');
  });

  it('refuses a proxy list entry that is not an address, naming it', () => {
    expect(() => parseTrustedProxies('10.0.0.0/8,gateway')).toThrow(/'gateway' is not an IP address/);
    expect(() => parseTrustedProxies('10.0.0.0/33')).toThrow(/invalid prefix length/);
  });
});
