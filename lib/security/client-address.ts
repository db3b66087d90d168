import { BlockList, isIP } from 'node:net';

// Who is asking, as far as the network can tell. lib/server/serve.mjs writes the socket's own address into PEER_HEADER on
// every request (overwriting anything a client sent), and marks the process so this module knows the header is
// real. The X-Forwarded-For chain is believed only hop by hop from that socket address leftwards, while each hop
// is one of TRUSTED_PROXIES: the right-most hop that is not a trusted proxy is the client. A client therefore
// cannot pick its address by sending the header itself.
export const PEER_HEADER = 'x-dutywise-peer';

const marker = globalThis as { __dutywisePeerHeader?: boolean };

/** True when this process was started by lib/server/serve.mjs, so PEER_HEADER carries the socket address. */
export function peerHeaderTrusted(): boolean {
  return marker.__dutywisePeerHeader === true;
}

/** Strips the IPv4-mapped IPv6 prefix (::ffff:192.0.2.1) and any brackets or zone. */
export function normaliseAddress(raw: string): string {
  const a = raw
    .trim()
    .replace(/^\[|\]$/g, '')
    .replace(/%.*$/, '');
  const mapped = /^::ffff:(\d+\.\d+\.\d+\.\d+)$/i.exec(a);
  return mapped?.[1] ?? a.toLowerCase();
}

/** Parses "192.0.2.10, 10.0.0.0/8, fd00::/8" into a block list; throws naming the entry that is not an address. */
export function parseTrustedProxies(spec: string): BlockList {
  const list = new BlockList();
  for (const entry of spec
    .split(',')
    .map((e) => e.trim())
    .filter(Boolean)) {
    const [addr = '', prefix] = entry.split('/');
    const family = isIP(addr);
    if (!family) throw new Error(`TRUSTED_PROXIES: '${entry}' is not an IP address or CIDR range`);
    const type = family === 6 ? 'ipv6' : 'ipv4';
    if (prefix === undefined) list.addAddress(addr, type);
    else {
      const bits = Number(prefix);
      if (!Number.isInteger(bits) || bits < 0 || bits > (family === 6 ? 128 : 32))
        throw new Error(`TRUSTED_PROXIES: '${entry}' has an invalid prefix length`);
      list.addSubnet(addr, bits, type);
    }
  }
  return list;
}

function trusted(list: BlockList, addr: string): boolean {
  const family = isIP(addr);
  return family !== 0 && list.check(addr, family === 6 ? 'ipv6' : 'ipv4');
}

/**
 * The client's address for this request. Without lib/server/serve.mjs (next dev, tests calling handlers directly) there is
 * no socket address to start from, and the right-most X-Forwarded-For hop stands in: Next fills that header from
 * the socket when a client sent none. A production start refuses to run without lib/server/serve.mjs.
 */
export function clientAddress(headers: Headers, proxies: BlockList): string {
  const chain = (headers.get('x-forwarded-for') ?? '').split(',').map(normaliseAddress).filter(Boolean);
  let current = peerHeaderTrusted() ? normaliseAddress(headers.get(PEER_HEADER) ?? '') : (chain.pop() ?? '');
  while (trusted(proxies, current) && chain.length) current = chain.pop()!;
  return current.slice(0, 64) || 'unknown';
}

/** The rate-limit key of an address: IPv6 clients are counted per /64, which one subscriber usually holds whole. */
export function addressKey(addr: string): string {
  if (isIP(addr) !== 6) return addr;
  const groups = expandIpv6(addr).slice(0, 4);
  return `${groups.join(':')}::/64`;
}

function expandIpv6(addr: string): string[] {
  const [head = '', tail] = addr.split('::');
  const h = head ? head.split(':') : [];
  const t = tail ? tail.split(':') : [];
  const missing = tail === undefined ? 0 : 8 - h.length - t.length;
  return [...h, ...Array<string>(missing).fill('0'), ...t].map((g) => g.replace(/^0+(?=.)/, ''));
}
