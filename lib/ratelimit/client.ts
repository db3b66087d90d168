import 'server-only';
import { env } from '@/lib/env';
import { addressKey, clientAddress, parseTrustedProxies } from '@/lib/security/client-address';

const proxies = parseTrustedProxies(env.TRUSTED_PROXIES);

/** The client's address for this request, under the configured trusted proxies. */
export function clientAddressOf(headers: Headers): string {
  return clientAddress(headers, proxies);
}

/** The rate-limit key of the request's client: its address, or its /64 for IPv6. */
export function clientKey(headers: Headers): string {
  return addressKey(clientAddressOf(headers));
}
